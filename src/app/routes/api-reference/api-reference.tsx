import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { PageHeader } from '../../../components/ui/page-header';
import { openApiDocumentQueryOptions } from '../../../features/api-reference/api';
import { ApiReferenceView } from '../../../features/api-reference/components/api-reference-view';

export const apiReferenceLoader = (queryClient: QueryClient) => async () => {
  await queryClient.ensureQueryData(openApiDocumentQueryOptions());
  return null;
};

export function ApiReferenceRoute() {
  const { data: document } = useSuspenseQuery(openApiDocumentQueryOptions());
  return (
    <>
      <PageHeader
        title="API reference"
        description={
          <>
            {document.info.title} {document.info.version}. Scripts sign in with an API token as{' '}
            <code className="font-mono text-xs">Authorization: Bearer &lt;token&gt;</code>; the machine-readable document
            is at{' '}
            <a href="/api/openapi.json" className="text-slate-info underline underline-offset-2">
              /api/openapi.json
            </a>
            .
          </>
        }
      />
      <ApiReferenceView document={document} />
    </>
  );
}
