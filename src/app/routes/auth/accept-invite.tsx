import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { useQuery, type QueryClient } from '@tanstack/react-query';
import { AuthLayout } from '../../../components/layouts/auth-layout';
import { ErrorState } from '../../../components/ui/error-state';
import { FormAlert } from '../../../components/ui/form-alert';
import { LoadingState } from '../../../components/ui/loading-state';
import { isApiError } from '../../../lib/api-client';
import { roleLabels } from '../../../lib/roles';
import { invitePreviewQueryOptions } from '../../../features/auth/api';
import { AcceptInviteForm } from '../../../features/auth/components/accept-invite-form';

export const acceptInviteLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    // Warm only: an unknown or used invitation is a message on this page, not a crash.
    await queryClient.ensureQueryData(invitePreviewQueryOptions(params.token ?? '')).catch(() => undefined);
    return null;
  };

const signInLink = (
  <Link to="/signin" className="text-slate-info underline-offset-2 hover:underline">
    Go to sign in
  </Link>
);

export function AcceptInviteRoute() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const preview = useQuery(invitePreviewQueryOptions(token));

  if (preview.isPending) {
    return (
      <AuthLayout title="Accept invite">
        <LoadingState label="Reading the invitation…" />
      </AuthLayout>
    );
  }

  if (preview.isError) {
    // 404: unknown, used or revoked; 400: a token that cannot be one (a mangled link).
    const gone = isApiError(preview.error) && (preview.error.status === 404 || preview.error.status === 400);
    return (
      <AuthLayout title="Accept invite" footer={signInLink}>
        {gone ? (
          <FormAlert>
            This invitation is not valid any more: it may have been used, revoked or have expired. Ask the workspace owner
            to send a new one.
          </FormAlert>
        ) : (
          <ErrorState title="The invitation could not be read" error={preview.error} onRetry={() => void preview.refetch()} />
        )}
      </AuthLayout>
    );
  }

  const invite = preview.data;
  return (
    <AuthLayout
      title={`Join ${invite.workspaceName}`}
      intro="Choose your name and a password to accept the invitation."
      footer={signInLink}
    >
      <dl className="mb-5 grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1 rounded-md border border-rule bg-paper px-3 py-2 text-sm">
        <dt className="text-muted">Workspace</dt>
        <dd className="font-medium">{invite.workspaceName}</dd>
        <dt className="text-muted">Role</dt>
        <dd className="font-medium">{roleLabels[invite.role]}</dd>
        <dt className="text-muted">Email</dt>
        <dd className="break-all">{invite.email}</dd>
      </dl>
      <AcceptInviteForm token={token} onAccepted={() => navigate('/boms', { replace: true })} />
    </AuthLayout>
  );
}
