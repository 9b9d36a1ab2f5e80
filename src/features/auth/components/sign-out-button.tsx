import { Button } from '../../../components/ui/button';
import { useLogout } from '../hooks';

export function SignOutButton({ onSignedOut }: { onSignedOut: () => void }) {
  const logout = useLogout();
  return (
    <span className="inline-flex items-center gap-2">
      {logout.isError ? (
        <span role="alert" className="text-xs text-brick">
          Signing out failed. Try again.
        </span>
      ) : null}
      <Button
        variant="secondary"
        size="sm"
        pending={logout.isPending}
        onClick={() => logout.mutate(undefined, { onSuccess: onSignedOut })}
      >
        Sign out
      </Button>
    </span>
  );
}
