// Types only (erased at build): the derating engine's helpers are the source of these shapes.
import type {
  AccessiblePartInput,
  AccessiblePartResult,
  DischargeInput,
  DischargeResult,
  JunctionTempInput,
  JunctionTempResult,
  MultiplierInput,
  MultiplierPosition,
  MultiplierResult,
  ResistorStringInput,
  ResistorStringResult,
  SafeVoltagePreset,
} from '../../../server/derating';

export type {
  AccessiblePartInput,
  AccessiblePartResult,
  DischargeInput,
  DischargeResult,
  JunctionTempInput,
  JunctionTempResult,
  MultiplierInput,
  MultiplierPosition,
  MultiplierResult,
  ResistorStringInput,
  ResistorStringResult,
  SafeVoltagePreset,
};

/**
 * The safe-voltage presets of the bleeder helper, each naming its source. Read from the
 * pure derating engine (as the money helpers read the engine's minor units) so the
 * client offers exactly the presets the server documents; the API has no list of them.
 */
export { SAFE_VOLTAGE_PRESETS } from '../../../server/derating/helpers/discharge';

/** The caution the helpers' answers carry, to show before anything is worked out (same source). */
export { CAUTION_TEXT } from '../../../server/derating/caution';

/** Each helper's endpoint with its input and its result. */
export type HelperEndpoints = {
  multiplier: { input: MultiplierInput; result: MultiplierResult };
  'resistor-string': { input: ResistorStringInput; result: ResistorStringResult };
  discharge: { input: DischargeInput; result: DischargeResult };
  'accessible-part': { input: AccessiblePartInput; result: AccessiblePartResult };
  'junction-temp': { input: JunctionTempInput; result: JunctionTempResult };
};
export type HelperName = keyof HelperEndpoints;
