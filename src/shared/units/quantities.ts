/**
 * The physical quantities a value field can hold, with the symbol we print and
 * the words error messages use. One table so the parser, the formatter and the
 * zod helper agree on names.
 */
export const QUANTITIES = [
  'resistance',
  'capacitance',
  'voltage',
  'current',
  'power',
  'temperature',
  'frequency',
  'inductance',
  'plain',
] as const;

export type Quantity = (typeof QUANTITIES)[number];

interface QuantityInfo {
  /** Unit symbol printed by formatValue ('' for plain numbers). */
  symbol: string;
  /** "a voltage", used in messages. */
  label: string;
  /** A typical value in the trade's notation, used in messages. */
  example: string;
}

export const QUANTITY_INFO: Record<Quantity, QuantityInfo> = {
  resistance: { symbol: 'Ω', label: 'a resistance', example: '4K7' },
  capacitance: { symbol: 'F', label: 'a capacitance', example: '2n2' },
  voltage: { symbol: 'V', label: 'a voltage', example: '2kV' },
  current: { symbol: 'A', label: 'a current', example: '700mA' },
  power: { symbol: 'W', label: 'a power', example: '250mW' },
  temperature: { symbol: '°C', label: 'a temperature', example: '85°C' },
  frequency: { symbol: 'Hz', label: 'a frequency', example: '50kHz' },
  inductance: { symbol: 'H', label: 'an inductance', example: '10µH' },
  plain: { symbol: '', label: 'a plain number', example: '4.7k' },
};
