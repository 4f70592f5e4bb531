// /set-password?token=…: the page an invitation or reset link opens. Open without a session;
// setting the password signs the person in and takes them home.
import { useNavigate, useSearchParams } from 'react-router';
import { SetPasswordForm } from '../../features/auth/components/set-password-form';
import { useDocumentTitle } from '../../lib/document-title';
import { Brand } from '../shell/brand';

export function SetPasswordRoute() {
  useDocumentTitle('Choose a password');
  const [params] = useSearchParams();
  const navigate = useNavigate();
  return (
    <main className="mx-auto flex min-h-dvh w-full max-w-md flex-col justify-center gap-6 p-4 sm:p-6">
      <Brand />
      <h1 className="text-2xl font-bold">Choose a password</h1>
      <div className="rounded-panel border-2 border-line bg-surface p-4 sm:p-6">
        <SetPasswordForm
          token={params.get('token') ?? ''}
          onDone={() => void navigate('/', { replace: true })}
        />
      </div>
    </main>
  );
}
