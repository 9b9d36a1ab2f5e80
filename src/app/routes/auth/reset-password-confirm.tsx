import { Link, useNavigate, useParams } from 'react-router-dom';
import { AuthLayout } from '../../../components/layouts/auth-layout';
import { ResetConfirmForm } from '../../../features/auth/components/reset-confirm-form';

export function ResetPasswordConfirmRoute() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  return (
    <AuthLayout
      title="Choose a new password"
      footer={
        <>
          <Link to="/reset-password" className="text-slate-info underline-offset-2 hover:underline">
            Ask for a new link
          </Link>
          <Link to="/signin" className="text-slate-info underline-offset-2 hover:underline">
            Back to sign in
          </Link>
        </>
      }
    >
      <ResetConfirmForm
        token={token}
        onDone={() =>
          navigate('/signin', {
            replace: true,
            state: { notice: 'Your password has been changed. Sign in with the new one.' },
          })
        }
      />
    </AuthLayout>
  );
}
