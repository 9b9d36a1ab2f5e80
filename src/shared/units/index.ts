// The value parser shared by the client and the server. Imports only zod and itself.
export { QUANTITIES, QUANTITY_INFO, type Quantity } from './quantities';
export { parseValue, type ParseResult } from './parse-value';
export { formatValue, type FormatOptions } from './format-value';
export { valueField } from './value-field';
