// /unlock?token=…: the page a "sign-in was paused" e-mail opens. Open without a session.
import { Link, useSearchParams } from 'react-router';
import { UnlockSignIn } from '../../features/auth/components/unlock-sign-in';
import { useDocumentTitle } from '../../lib/document-title';
import { Brand } from '../shell/brand';

export function UnlockRoute() {
  useDocumentTitle('Lift the sign-in pause');
  const [params] = useSearchParams();
  return (
    <main className="mx-auto flex min-h-dvh w-full max-w-md flex-col justify-center gap-6 p-4 sm:p-6">
      <Brand />
      <h1 className="text-2xl font-bold">Lift the sign-in pause</h1>
      <div className="rounded-panel border-2 border-line bg-surface p-4 sm:p-6">
        <UnlockSignIn token={params.get('token') ?? ''} />
      </div>
      <p>
        <Link to="/sign-in" className="font-semibold underline underline-offset-4">
          Back to sign-in
        </Link>
      </p>
    </main>
  );
}
