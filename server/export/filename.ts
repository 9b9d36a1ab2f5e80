/** Characters that file systems or the Content-Disposition header cannot take. */
// eslint-disable-next-line no-control-regex
const UNSAFE = /[\u0000-\u001F\u007F"*/:<>?\\|]+/g;

/**
 * `<bom name> rev <n> costed BOM.xlsx`, safe as a file name on every desktop system:
 * control characters, quotes and path separators become spaces, runs of spaces one,
 * no leading dots, at most 120 characters of name.
 */
export function exportFilename(bomName: string, revision: number): string {
  const name = bomName.replace(UNSAFE, ' ').replace(/\s+/g, ' ').replace(/^[.\s]+/, '').slice(0, 120).trim();
  return `${name || 'BOM'} rev ${revision} costed BOM.xlsx`;
}
