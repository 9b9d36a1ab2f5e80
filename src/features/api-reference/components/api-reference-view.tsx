import { useMemo } from 'react';
import { groupByTag, listOperations, type OpenApiDocument } from '../openapi';
import { EmptyState } from '../../../components/ui/empty-state';
import { OperationCard, operationAnchor } from './operation-card';

function tagAnchor(tag: string): string {
  return `tag-${tag.toLowerCase().replace(/[^a-z0-9]+/g, '-')}`;
}

/** The whole API, one section per tag, with a contents list to jump around. */
export function ApiReferenceView({ document }: { document: OpenApiDocument }) {
  const groups = useMemo(() => groupByTag(document, listOperations(document)), [document]);

  if (groups.length === 0) {
    return <EmptyState title="The API document lists no operations." />;
  }

  return (
    <div className="grid gap-8 lg:grid-cols-[14rem_1fr]">
      <nav aria-label="API sections" className="lg:sticky lg:top-4 lg:max-h-[calc(100vh-2rem)] lg:self-start lg:overflow-auto">
        <ul className="flex flex-col gap-3 text-sm">
          {groups.map((group) => (
            <li key={group.tag}>
              <a href={`#${tagAnchor(group.tag)}`} className="font-medium text-ink hover:text-copper-dark">
                {group.tag}
              </a>
              <ul className="mt-1 flex flex-col gap-0.5 border-l border-rule pl-3">
                {group.operations.map((operation) => (
                  <li key={`${operation.method} ${operation.path}`}>
                    <a href={`#${operationAnchor(operation)}`} className="font-mono text-xs text-muted hover:text-ink">
                      {operation.method} {operation.path}
                    </a>
                  </li>
                ))}
              </ul>
            </li>
          ))}
        </ul>
      </nav>
      <div className="flex min-w-0 flex-col gap-10">
        {groups.map((group) => (
          <section key={group.tag} id={tagAnchor(group.tag)} aria-labelledby={`${tagAnchor(group.tag)}-title`} className="scroll-mt-4">
            <h2 id={`${tagAnchor(group.tag)}-title`} className="text-lg font-semibold">
              {group.tag}
            </h2>
            {group.description ? <p className="mt-1 text-sm text-muted">{group.description}</p> : null}
            <div className="mt-3 flex flex-col gap-3">
              {group.operations.map((operation) => (
                <OperationCard key={`${operation.method} ${operation.path}`} operation={operation} />
              ))}
            </div>
          </section>
        ))}
      </div>
    </div>
  );
}
