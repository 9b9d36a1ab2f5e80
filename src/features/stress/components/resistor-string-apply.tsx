import { useState } from 'react';
import { formatValue } from '../../../shared/units';
import { isStaleVersion, STALE_VERSION_MESSAGE } from '../../../lib/stale-version';
import { Button } from '../../../components/ui/button';
import { describeError } from '../../../components/ui/error-state';
import { FormAlert } from '../../../components/ui/form-alert';
import type { ResistorStringResult } from '../../../../server/derating';
import { useWriteOperatingPoints } from '../hooks';
import { resistorStringWrite } from '../helper-writes';
import type { LineRef } from '../line-ref';

/** Writes the string's worst-case voltage across one resistor into the chosen resistor line. */
export function ResistorStringApply({ bomId, result, line }: { bomId: string; result: ResistorStringResult; line: LineRef | null }) {
  const write = useWriteOperatingPoints(bomId);
  const [done, setDone] = useState<string | null>(null);
  if (!line) return <p className="text-sm text-muted">Choose a resistor line above to write the result into it.</p>;
  const voltage = formatValue(result.worstEachV, 'voltage');
  const qty = Number(line.qtyPerUnit);
  return (
    <section aria-label="Write into a line" className="flex flex-col gap-2 rounded-md border border-copper/40 bg-copper/5 p-3">
      {Number.isFinite(qty) && qty !== result.count ? (
        <p className="text-sm">
          The string needs {result.count} resistors; {line.refDes || 'the line'} has {line.qtyPerUnit} per unit. Change the quantity and the designators in the
          Lines tab if you follow it.
        </p>
      ) : null}
      {write.error ? <FormAlert>{isStaleVersion(write.error) ? STALE_VERSION_MESSAGE : describeError(write.error)}</FormAlert> : null}
      {done ? <FormAlert tone="success">{done}</FormAlert> : null}
      <div>
        <Button
          size="sm"
          pending={write.isPending}
          onClick={() => {
            setDone(null);
            write.mutate([resistorStringWrite(result, line)], { onSuccess: () => setDone(`${line.refDes || 'The line'} now works at ${voltage} per resistor.`) });
          }}
        >
          Write {voltage} into {line.refDes || 'the line'}
        </Button>
      </div>
    </section>
  );
}
