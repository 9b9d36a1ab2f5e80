/**
 * A JSON answer already written as text — a stored result read with `::text` — sent as it
 * is: parsing a large stored result only to write it out again was most of the work of
 * serving it.
 */
export class RawJson {
  constructor(readonly text: string) {}
}
