// /forgot-password: ask for a link to set a new password. Open without a session.
import { Link } from 'react-router';
import { ForgotPasswordForm } from '../../features/auth/components/forgot-password-form';
import { useDocumentTitle } from '../../lib/document-title';
import { Brand } from '../shell/brand';

export function ForgotPasswordRoute() {
  useDocumentTitle('Forgot password');
  return (
    <main className="mx-auto flex min-h-dvh w-full max-w-md flex-col justify-center gap-6 p-4 sm:p-6">
      <Brand />
      <div className="flex flex-col gap-2">
        <h1 className="text-2xl font-bold">Forgot your password?</h1>
        <p className="text-ink-muted">
          Enter the address you sign in with. If it belongs to an account, a link to choose a new
          password goes to it.
        </p>
      </div>
      <div className="rounded-panel border-2 border-line bg-surface p-4 sm:p-6">
        <ForgotPasswordForm />
      </div>
      <p>
        <Link to="/sign-in" className="font-semibold underline underline-offset-4">
          Back to sign-in
        </Link>
      </p>
    </main>
  );
}
