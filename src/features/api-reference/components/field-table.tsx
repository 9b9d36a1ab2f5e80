import type { Field } from '../openapi';

/** A request or response shape as a compact table of dotted field paths. */
export function FieldTable({ label, fields }: { label: string; fields: Field[] }) {
  if (fields.length === 0) return <p className="text-sm text-muted">No fields.</p>;
  return (
    <table aria-label={label} className="w-full table-fixed border-collapse text-sm">
      <colgroup>
        <col className="w-[34%]" />
        <col className="w-[26%]" />
        <col />
      </colgroup>
      <thead>
        <tr className="border-b border-rule text-left text-xs font-semibold tracking-wide text-muted uppercase">
          <th scope="col" className="py-1.5 pr-3">Field</th>
          <th scope="col" className="py-1.5 pr-3">Type</th>
          <th scope="col" className="py-1.5">Notes</th>
        </tr>
      </thead>
      <tbody>
        {fields.map((field) => (
          <tr key={field.path} className="border-b border-rule/60 align-top last:border-b-0">
            <td className="py-1.5 pr-3 font-mono text-xs break-words text-ink">
              {field.path}
              {field.required ? (
                <span className="ml-1.5 font-sans text-[0.7rem] font-semibold text-copper-dark">required</span>
              ) : null}
            </td>
            <td className="py-1.5 pr-3 font-mono text-xs break-words text-muted">{field.type}</td>
            <td className="py-1.5 text-xs break-words text-muted">
              {[field.description, ...field.constraints].filter(Boolean).join(' · ') || '—'}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
