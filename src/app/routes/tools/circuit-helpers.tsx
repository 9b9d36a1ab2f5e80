import { CautionNotice } from '../../../components/ui/caution-notice';
import { PageHeader } from '../../../components/ui/page-header';
import { CAUTION_TEXT } from '../../../features/tools/api';
import { AccessiblePartHelper } from '../../../features/tools/components/accessible-part-helper';
import { DischargeHelper } from '../../../features/tools/components/discharge-helper';
import { HelperSection } from '../../../features/tools/components/helper-parts';
import { JunctionTempHelper } from '../../../features/tools/components/junction-temp-helper';
import { MultiplierHelper } from '../../../features/tools/components/multiplier-helper';
import { ResistorStringHelper } from '../../../features/tools/components/resistor-string-helper';

const helpers = [
  { id: 'multiplier', title: 'Multiplier' },
  { id: 'resistor-string', title: 'Resistor string' },
  { id: 'discharge', title: 'Bleeder discharge' },
  { id: 'accessible-part', title: 'Accessible high-voltage part' },
  { id: 'junction-temp', title: 'Junction temperature' },
] as const;

/**
 * The circuit helpers on their own page: each works a figure out on the server and
 * shows the formula it used and the caution. On a BOM's Stress check tab the multiplier
 * and the resistor string can also write their results into lines.
 */
export function CircuitHelpersRoute() {
  return (
    <>
      <PageHeader
        title="Circuit helpers"
        description="Worst-case figures for high-voltage parts, in the trade's notations (2kV, 1n, 22M, 50kHz). They screen a design for review; they do not make it safe."
      />
      <CautionNotice className="mb-4">{CAUTION_TEXT}</CautionNotice>
      <nav aria-label="Helpers on this page" className="mb-5">
        <ul className="flex flex-wrap gap-x-4 gap-y-1 text-sm">
          {helpers.map((h) => (
            <li key={h.id}>
              <a href={`#${h.id}`} className="text-copper-dark underline-offset-2 hover:underline">
                {h.title}
              </a>
            </li>
          ))}
        </ul>
      </nav>
      <div className="flex flex-col gap-6">
        <HelperSection
          id="multiplier"
          title="Multiplier"
          intro="A half-wave Cockcroft-Walton (Greinacher) multiplier of n stages with equal capacitors: its output, ripple and drop under load, and the voltage each capacitor and diode sees."
        >
          <MultiplierHelper />
        </HelperSection>
        <HelperSection
          id="resistor-string"
          title="Resistor string"
          intro="The fewest equal resistors in series across a voltage so that each stays within the voltage limit, in the worst tolerance case (one at +t, the rest at −t)."
        >
          <ResistorStringHelper />
        </HelperSection>
        <HelperSection
          id="discharge"
          title="Bleeder discharge"
          intro="How long a capacitor takes to fall to a safe voltage through its bleeder, and the largest resistor that meets a deadline. Pick the safe voltage that applies to the product."
        >
          <DischargeHelper />
        </HelperSection>
        <HelperSection
          id="accessible-part"
          title="Accessible high-voltage part"
          intro="The charge and energy a user could touch on a charged part, against the household-appliance limits for its voltage band."
        >
          <AccessiblePartHelper />
        </HelperSection>
        <HelperSection id="junction-temp" title="Junction temperature" intro="Tj = Ta + P·Rth(j-a) for a transistor or diode, and the dissipation allowed at an ambient.">
          <JunctionTempHelper />
        </HelperSection>
      </div>
    </>
  );
}
