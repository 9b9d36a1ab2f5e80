import { Link } from 'react-router-dom';
import { AuthLayout } from '../../../components/layouts/auth-layout';
import { ResetRequestForm } from '../../../features/auth/components/reset-request-form';

export function ResetPasswordRequestRoute() {
  return (
    <AuthLayout
      title="Reset your password"
      intro="Enter the e-mail address you sign in with. We will send a link to choose a new password."
      footer={
        <Link to="/signin" className="text-slate-info underline-offset-2 hover:underline">
          Back to sign in
        </Link>
      }
    >
      <ResetRequestForm />
    </AuthLayout>
  );
}
