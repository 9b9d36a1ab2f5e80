import { roleLabels } from '../../../lib/roles';
import type { Access, Operation } from '../openapi';
import { FieldTable } from './field-table';

const methodTones: Record<string, string> = {
  GET: 'bg-slate-info/10 text-slate-info',
  POST: 'bg-verdigris/10 text-verdigris',
  PUT: 'bg-ochre/15 text-[#8a6212]',
  PATCH: 'bg-ochre/15 text-[#8a6212]',
  DELETE: 'bg-brick/10 text-brick',
};

function accessText(access: Access): string {
  switch (access.kind) {
    case 'public':
      return 'No sign-in needed';
    case 'signed-in':
      return 'Any signed-in member';
    case 'roles':
      return access.roles.length === 4 ? 'Any member' : access.roles.map((role) => roleLabels[role]).join(', ');
  }
}

export function operationAnchor(operation: Operation): string {
  return `op-${operation.method.toLowerCase()}-${operation.path.replace(/[^a-zA-Z0-9]+/g, '-').replace(/^-|-$/g, '')}`;
}

export function OperationCard({ operation }: { operation: Operation }) {
  const anchor = operationAnchor(operation);
  return (
    <article id={anchor} aria-labelledby={`${anchor}-title`} className="scroll-mt-4 rounded-lg border border-rule bg-surface p-4">
      <h3 id={`${anchor}-title`} className="flex flex-wrap items-center gap-2">
        <span className={`rounded px-1.5 py-0.5 font-mono text-xs font-semibold ${methodTones[operation.method] ?? 'bg-paper text-ink'}`}>
          {operation.method}
        </span>
        <code className="font-mono text-sm font-medium text-ink">{operation.path}</code>
        {operation.deprecated ? <span className="text-xs font-medium text-brick">deprecated</span> : null}
      </h3>
      {operation.summary ? <p className="mt-2 text-sm text-ink">{operation.summary}</p> : null}
      {operation.description && operation.description !== operation.summary ? (
        <p className="mt-1 text-sm whitespace-pre-line text-muted">{operation.description}</p>
      ) : null}
      <dl className="mt-3 grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-muted">Required role</dt>
        <dd className="text-ink">{accessText(operation.access)}</dd>
      </dl>

      {operation.parameters.length > 0 ? (
        <section className="mt-4">
          <h4 className="mb-1 text-xs font-semibold tracking-wide text-muted uppercase">Parameters</h4>
          <FieldTable label={`Parameters of ${operation.method} ${operation.path}`} fields={operation.parameters} />
        </section>
      ) : null}

      {operation.requestFields ? (
        <section className="mt-4">
          <h4 className="mb-1 text-xs font-semibold tracking-wide text-muted uppercase">
            Request body{operation.requestContentType && !operation.requestContentType.includes('json') ? ` (${operation.requestContentType})` : ''}
          </h4>
          <FieldTable label={`Request body of ${operation.method} ${operation.path}`} fields={operation.requestFields} />
        </section>
      ) : null}

      {operation.responses.length > 0 ? (
        <section className="mt-4">
          <h4 className="mb-1 text-xs font-semibold tracking-wide text-muted uppercase">Responses</h4>
          <ul className="flex flex-col gap-2">
            {operation.responses.map((response) => (
              <li key={response.status} className="text-sm">
                <span className="font-mono text-xs font-semibold tabular-nums">{response.status}</span>{' '}
                <span className="text-muted">{response.description}</span>
                {response.fields.length > 0 ? (
                  <details className="mt-1 ml-6">
                    <summary className="cursor-pointer text-xs text-slate-info">Fields</summary>
                    <div className="mt-1">
                      <FieldTable
                        label={`Response ${response.status} of ${operation.method} ${operation.path}`}
                        fields={response.fields}
                      />
                    </div>
                  </details>
                ) : null}
              </li>
            ))}
          </ul>
        </section>
      ) : null}
    </article>
  );
}
