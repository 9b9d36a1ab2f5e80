import { z } from 'zod';
import { parseValue } from './parse-value';
import type { Quantity } from './quantities';

/**
 * A zod field for a number in base units that also accepts the trade's
 * notations as text ("2kV", "4K7", "1/4W"), so forms and API bodies share one
 * rule. Strings go through parseValue with `quantity` expected and its message
 * becomes the issue; numbers must be finite and, except temperatures, not
 * negative, the same rule as for text. The output is always a number.
 */
export function valueField(quantity: Quantity) {
  return z
    .union([z.number(), z.string()], { error: 'expected a number or a value such as 2kV' })
    .transform((input, ctx) => {
      if (typeof input === 'number') {
        if (input < 0 && quantity !== 'temperature') {
          ctx.addIssue({ code: 'custom', message: 'negative values are only accepted for temperatures', input });
          return z.NEVER;
        }
        return input;
      }
      const result = parseValue(input, quantity);
      if (!result.ok) {
        ctx.addIssue({ code: 'custom', message: result.message, input });
        return z.NEVER;
      }
      return result.value;
    });
}
