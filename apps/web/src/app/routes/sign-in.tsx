// /sign-in: the only screen open without a session.
import type { QueryClient } from '@tanstack/react-query';
import {
  Link,
  redirect,
  useNavigate,
  useSearchParams,
  type LoaderFunctionArgs,
} from 'react-router';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { getMe, meQueryKey } from '../../lib/auth';
import { useDocumentTitle } from '../../lib/document-title';
import { safeNextPath } from '../guards';
import { Brand } from '../shell/brand';

export function signInLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    // Ask the server, not the cache: a cached "me" may belong to a session that just expired.
    try {
      const me = await getMe(request.signal);
      queryClient.setQueryData(meQueryKey, me);
    } catch {
      return null;
    }
    throw redirect(safeNextPath(new URL(request.url).searchParams.get('next')));
  };
}

export function SignInRoute() {
  useDocumentTitle('Sign in');
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const next = safeNextPath(params.get('next'));
  return (
    <main className="mx-auto flex min-h-dvh w-full max-w-md flex-col justify-center gap-6 p-4 sm:p-6">
      <Brand />
      <div className="flex flex-col gap-2">
        <h1 className="text-2xl font-bold">Sign in</h1>
        <p className="text-ink-muted">
          Use your e-mail address and the password you chose, or the one your workshop lead gave
          you.
        </p>
      </div>
      <div className="rounded-panel border-2 border-line bg-surface p-4 sm:p-6">
        <SignInForm onSignedIn={() => void navigate(next, { replace: true })} />
      </div>
      <p>
        <Link to="/forgot-password" className="font-semibold underline underline-offset-4">
          Forgot your password?
        </Link>
      </p>
    </main>
  );
}
