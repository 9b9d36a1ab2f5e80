/**
 * The caution shown beside every stress result and circuit helper. Kept as separate
 * sentences so the client can lay them out; `CAUTION_TEXT` is the same as one paragraph.
 */
export const CAUTION: readonly string[] = [
  'High voltage can injure, even after the product is switched off: charged capacitors and multipliers hold their charge.',
  'These checks screen a design for review; they do not make it safe or certifiable.',
  "The applicable appliance safety standard, local codes, the exact part's datasheet and a qualified engineer or test house decide.",
  'Tolerances, transients, the temperature inside the enclosure and single faults, such as an open bleeder resistor, all matter.',
];

export const CAUTION_TEXT = CAUTION.join(' ');
