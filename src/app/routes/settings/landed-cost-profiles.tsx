import { useSearchParams } from 'react-router-dom';
import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { can } from '../../../shared/permissions';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { PageHeader } from '../../../components/ui/page-header';
import { useSession } from '../../../features/auth/session-context';
import { profilesQueryOptions } from '../../../features/profiles/api';
import { ProfileForm } from '../../../features/profiles/components/profile-form';
import { ProfilesTable } from '../../../features/profiles/components/profiles-table';

export const landedCostProfilesLoader = (queryClient: QueryClient) => async () => {
  await queryClient.ensureQueryData(profilesQueryOptions());
  return null;
};

export function LandedCostProfilesRoute() {
  const session = useSession();
  const [params, setParams] = useSearchParams();
  const { data: profiles } = useSuspenseQuery(profilesQueryOptions());
  const canWrite = can(session.role, 'profiles.write');
  const chosen = params.get('profile');
  const creating = chosen === 'new' && canWrite;
  const profile = profiles.find((p) => p.id === chosen);
  const choose = (id: string | null) =>
    setParams(
      (next) => {
        if (id) next.set('profile', id);
        else next.delete('profile');
        return next;
      },
      { replace: false },
    );

  return (
    <>
      <PageHeader
        title="Landed-cost profiles"
        description="The freight, insurance, duty, handling, attrition and assembly rates a cost roll and the quote board add to the price of parts."
        actions={canWrite ? <Button onClick={() => choose('new')}>New profile</Button> : null}
      />
      <div className="flex flex-col gap-8">
        <ProfilesTable profiles={profiles} selectedId={profile?.id ?? null} />

        {creating ? (
          <section aria-labelledby="profile-form-title" className="flex flex-col gap-3">
            <h2 id="profile-form-title" className="text-lg font-semibold">
              New profile
            </h2>
            <ProfileForm key="new" onDone={(saved) => choose(saved.id)} onCancel={() => choose(null)} />
          </section>
        ) : profile ? (
          <section aria-labelledby="profile-form-title" className="flex flex-col gap-3">
            <h2 id="profile-form-title" className="text-lg font-semibold">
              {canWrite ? `Edit “${profile.name}”` : profile.name}
            </h2>
            <ProfileForm key={profile.id} profile={profile} readOnly={!canWrite} onDone={() => undefined} onCancel={() => choose(null)} />
          </section>
        ) : chosen && chosen !== 'new' ? (
          <EmptyState title="This profile is not in this workspace.">It may have been deleted, or the link is from another workspace.</EmptyState>
        ) : profiles.length > 0 ? (
          <p className="text-sm text-muted">Choose a profile by its name to {canWrite ? 'edit' : 'read'} every field.</p>
        ) : null}
      </div>
    </>
  );
}
