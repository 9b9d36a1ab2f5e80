import { Link, useLocation, useNavigate } from 'react-router-dom';
import { AuthLayout } from '../../../components/layouts/auth-layout';
import { FormAlert } from '../../../components/ui/form-alert';
import { SignInForm } from '../../../features/auth/components/sign-in-form';

export function SignInRoute() {
  const navigate = useNavigate();
  const location = useLocation();
  const notice = (location.state as { notice?: string } | null)?.notice;

  return (
    <AuthLayout
      title="Sign in"
      intro="Sign in to your workspace."
      footer={
        <>
          <Link to="/reset-password" className="text-slate-info underline-offset-2 hover:underline">
            Forgot your password?
          </Link>
          <span>
            New to Farthing?{' '}
            <Link to="/signup" className="text-slate-info underline-offset-2 hover:underline">
              Create a workspace
            </Link>
          </span>
        </>
      }
    >
      {notice ? (
        <div className="mb-4">
          <FormAlert tone="success">{notice}</FormAlert>
        </div>
      ) : null}
      <SignInForm onSignedIn={() => navigate('/boms', { replace: true })} />
    </AuthLayout>
  );
}
