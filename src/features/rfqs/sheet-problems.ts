// The answer sheet's own column headings, so a problem reads like the sheet the supplier has open.
const columns: Record<string, string> = {
  currency: 'Currency',
  incoterm: 'Incoterm',
  moq: 'MOQ',
  orderMultiple: 'Order multiple',
  leadTimeDays: 'Lead time (days)',
  validUntil: 'Valid until',
  priceBreaks: 'Price breaks',
  itemId: 'Item',
  note: 'Note',
};

/**
 * A problem of an uploaded sheet in the sheet's words: "row 3.priceBreaks.1.unitPrice"
 * → "Row 3, Unit price 2". Anything else (a whole-file problem) is shown as it comes.
 */
export function sheetProblemPlace(path: string): string {
  const match = /^row (\d+)(?:\.(.+))?$/.exec(path);
  if (!match) return path === 'file' ? 'The file' : path;
  const [, row, field] = match;
  if (!field) return `Row ${row}`;
  const tier = /^priceBreaks\.(\d+)\.(minQty|unitPrice)$/.exec(field);
  if (tier) return `Row ${row}, ${tier[2] === 'minQty' ? 'Qty' : 'Unit price'} ${Number(tier[1]) + 1}`;
  const head = field.split('.')[0];
  return `Row ${row}, ${columns[head] ?? field}`;
}
