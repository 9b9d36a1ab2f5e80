import { Link, useNavigate } from 'react-router-dom';
import { AuthLayout } from '../../../components/layouts/auth-layout';
import { SignUpForm } from '../../../features/auth/components/sign-up-form';

export function SignUpRoute() {
  const navigate = useNavigate();
  return (
    <AuthLayout
      title="Create a workspace"
      intro="One workspace holds your team's BOMs, parts, suppliers and quotes. You will be its owner."
      footer={
        <span>
          Already have an account?{' '}
          <Link to="/signin" className="text-slate-info underline-offset-2 hover:underline">
            Sign in
          </Link>
        </span>
      }
    >
      <SignUpForm onSignedUp={() => navigate('/boms', { replace: true })} />
    </AuthLayout>
  );
}
