import { useId, useState, type FormEvent } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Button } from '../../../../components/ui/button';
import { describeError } from '../../../../components/ui/error-state';
import { FormAlert } from '../../../../components/ui/form-alert';
import { SelectField } from '../../../../components/ui/select-field';
import { formatDate } from '../../../../lib/format';
import { snapshotsQueryOptions, type BomDetail } from '../../api';
import { bomStateLabels, formatCount, formatPerUnit } from '../../display';
import { useSaveSnapshot } from '../../hooks';
import { CompareView } from './compare-view';

/**
 * Saved cost rolls of this revision, and a comparison of any two of them or of two
 * revisions of the family: what changed in every total and on every line.
 */
export function Snapshots({ bom, qty, date, mayWrite }: { bom: BomDetail; qty: number; date: string | undefined; mayWrite: boolean }) {
  const snapshots = useQuery(snapshotsQueryOptions(bom.id));
  const saveSnapshot = useSaveSnapshot(bom.id);
  const nameId = useId();
  const [name, setName] = useState('');
  const [saved, setSaved] = useState<string | null>(null);
  const [left, setLeft] = useState('');
  const [right, setRight] = useState('');
  const [compared, setCompared] = useState<{ left: string; right: string } | null>(null);

  const onSave = (event: FormEvent) => {
    event.preventDefault();
    setSaved(null);
    saveSnapshot.mutate(
      { name: name.trim(), qty, date },
      {
        onSuccess: (snapshot) => {
          setName('');
          setSaved(`Saved “${snapshot.name}” at ${formatCount(snapshot.qty)} units: ${formatPerUnit(snapshot.landedPerUnit)} ${snapshot.currency} per unit.`);
        },
      },
    );
  };

  const options = [
    { value: '', label: 'Choose…' },
    ...(snapshots.data ?? []).map((s) => ({ value: `snapshot:${s.id}`, label: `Snapshot “${s.name}” (${formatCount(s.qty)} units, ${s.date})` })),
    ...bom.revisions.map((r) => ({ value: `bom:${r.id}`, label: `Revision ${r.revision} now (${bomStateLabels[r.state]})` })),
  ];

  return (
    <section aria-labelledby={`${nameId}-title`} className="flex flex-col gap-4 rounded-lg border border-rule bg-surface p-4">
      <h3 id={`${nameId}-title`} className="text-base font-semibold">
        Snapshots and comparison
      </h3>
      {mayWrite ? (
        <form onSubmit={onSave} className="flex flex-wrap items-end gap-2" aria-label="Save snapshot">
          <div className="flex flex-col gap-1">
            <label htmlFor={nameId} className="text-sm font-medium">
              Snapshot name
            </label>
            <input
              id={nameId}
              value={name}
              maxLength={120}
              onChange={(event) => setName(event.target.value)}
              placeholder="Before the 2 kV cap swap"
              className="h-9 w-72 rounded-md border border-rule px-3 text-sm hover:border-muted"
            />
          </div>
          <Button type="submit" variant="secondary" pending={saveSnapshot.isPending} disabled={!name.trim()}>
            Save snapshot
          </Button>
          <p className="text-xs text-muted">Keeps this cost roll ({formatCount(qty)} units{date ? `, ${date}` : ', today'}) as it is now.</p>
        </form>
      ) : null}
      {saveSnapshot.isError ? <FormAlert>{describeError(saveSnapshot.error)}</FormAlert> : null}
      {saved ? <FormAlert tone="success">{saved}</FormAlert> : null}

      {snapshots.data && snapshots.data.length ? (
        <table aria-label="Snapshots" className="w-full border-collapse text-sm">
          <thead>
            <tr className="text-xs text-muted uppercase">
              <th scope="col" className="border-b border-rule py-1 text-left font-semibold">Name</th>
              <th scope="col" className="border-b border-rule py-1 text-right font-semibold">Quantity</th>
              <th scope="col" className="border-b border-rule py-1 text-right font-semibold">Costing date</th>
              <th scope="col" className="border-b border-rule py-1 text-right font-semibold">Landed / unit</th>
              <th scope="col" className="border-b border-rule py-1 text-right font-semibold">Saved</th>
            </tr>
          </thead>
          <tbody>
            {snapshots.data.map((s) => (
              <tr key={s.id} className="border-b border-rule/60">
                <td className="py-1">{s.name}</td>
                <td className="num py-1">{formatCount(s.qty)}</td>
                <td className="num py-1">{s.date}</td>
                <td className="num py-1">
                  {formatPerUnit(s.landedPerUnit)} <span className="text-muted">{s.currency}</span>
                </td>
                <td className="num py-1 text-muted">{formatDate(s.createdAt)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : (
        <p className="text-sm text-muted">No snapshots of this revision yet.</p>
      )}

      <form
        className="flex flex-wrap items-end gap-3"
        aria-label="Compare cost rolls"
        onSubmit={(event) => {
          event.preventDefault();
          if (left && right) setCompared({ left, right });
        }}
      >
        <SelectField label="Before" options={options} value={left} onChange={(e) => setLeft(e.target.value)} className="min-w-64" />
        <SelectField label="After" options={options} value={right} onChange={(e) => setRight(e.target.value)} className="min-w-64" />
        <Button type="submit" variant="secondary" disabled={!left || !right || left === right}>
          Compare
        </Button>
      </form>
      {compared ? <CompareView left={compared.left} right={compared.right} qty={qty} /> : null}
    </section>
  );
}
