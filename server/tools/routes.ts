import { z } from 'zod';
import { route, type RouteDef } from '../http/route';
import { errors } from '../http/errors';
import {
  computeMultiplier, multiplierInputSchema, computeResistorString, resistorStringInputSchema, computeDischarge, dischargeInputSchema,
  computeAccessiblePart, accessiblePartInputSchema, computeJunctionTemp, junctionTempInputSchema,
} from '../derating';

/** Runs a helper (its result carries the formula and the caution); its schema's complaints become a 400. */
function run<I, O>(fn: (input: I) => O, input: I): O {
  try {
    return fn(input);
  } catch (err) {
    if (err instanceof z.ZodError) throw errors.validation('The helper inputs are not valid.', err.issues.map((i) => ({ path: i.path.join('.') || 'body', message: i.message })));
    throw err;
  }
}

export const toolRoutes: RouteDef[] = [
  route({
    method: 'post', path: '/api/tools/multiplier', access: 'signedIn', tag: 'Circuit helpers', body: multiplierInputSchema,
    summary: 'Cockcroft-Walton (Greinacher) half-wave multiplier: output, ripple, drop, and the voltage each capacitor and diode sees. Inputs: stages, vPeakV, loadCurrentA, frequencyHz, capacitanceF.',
    handler: async ({ body: b }) => run(computeMultiplier, b as z.input<typeof multiplierInputSchema>),
  }),
  route({
    method: 'post', path: '/api/tools/resistor-string', access: 'signedIn', tag: 'Circuit helpers', body: resistorStringInputSchema,
    summary: 'The fewest equal resistors in series across a voltage so that each stays within the limit, worst case with tolerance. Inputs: totalV, resistanceOhm, powerW, levV, tolerancePct, limit.',
    handler: async ({ body: b }) => run(computeResistorString, b as z.input<typeof resistorStringInputSchema>),
  }),
  route({
    method: 'post', path: '/api/tools/discharge', access: 'signedIn', tag: 'Circuit helpers', body: dischargeInputSchema,
    summary: 'Bleeder discharge: time constant, time to a safe voltage, the largest resistor meeting a deadline. Inputs: capacitanceF, resistanceOhm, v0V, safeV (deadlineS optional).',
    handler: async ({ body: b }) => run(computeDischarge, b as z.input<typeof dischargeInputSchema>),
  }),
  route({
    method: 'post', path: '/api/tools/accessible-part', access: 'signedIn', tag: 'Circuit helpers', body: accessiblePartInputSchema,
    summary: 'Charge and energy of an accessible high-voltage part against the household-appliance limits. Inputs: capacitanceF, voltageV.',
    handler: async ({ body: b }) => run(computeAccessiblePart, b as z.input<typeof accessiblePartInputSchema>),
  }),
  route({
    method: 'post', path: '/api/tools/junction-temp', access: 'signedIn', tag: 'Circuit helpers', body: junctionTempInputSchema,
    summary: 'Junction temperature Tj = Ta + P·Rth(j-a), and the power allowed at an ambient. Inputs: ambientC, powerW, rthJaCPerW, tjMaxC, tjLimitC (optional).',
    handler: async ({ body: b }) => run(computeJunctionTemp, b as z.input<typeof junctionTempInputSchema>),
  }),
];
