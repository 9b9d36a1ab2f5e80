import type { Encoding } from './encoding';

/**
 * A JSON answer already written — a stored result read with `::text`, or one of its
 * compressed forms kept beside it — sent as it is: parsing a large stored result only to
 * write it out again was most of the work of serving it.
 */
export class RawJson {
  constructor(
    readonly text: string,
    /** The same answer compressed, for a client that accepts the encoding. */
    readonly compressed?: { encoding: Encoding; bytes: Buffer },
  ) {}
}
