/**
 * A JSON answer already written — a stored result read with `::text`, or its gzip kept
 * beside it — sent as it is: parsing a large stored result only to write it out again was
 * most of the work of serving it.
 */
export class RawJson {
  constructor(
    readonly text: string,
    /** The same answer gzip-compressed, for a client that accepts gzip. */
    readonly gzip?: Buffer,
  ) {}
}
