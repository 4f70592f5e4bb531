// /sign-in: the only screen open without a session. Signing in needs the network; when the server
// says the session has ended, whatever the tablet cached for the last person is forgotten here,
// once none of the signed-in screens is showing it any more.
import { onlineManager, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import {
  Link,
  redirect,
  useLoaderData,
  useNavigate,
  useSearchParams,
  type LoaderFunctionArgs,
} from 'react-router';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { isUnauthenticated } from '../../lib/api-client';
import { getMe, meQueryKey } from '../../lib/auth';
import { useDocumentTitle } from '../../lib/document-title';
import { useOnline } from '../../lib/online';
import { clearCachedData } from '../../lib/persist-cache';
import { safeNextPath } from '../guards';
import { Brand } from '../shell/brand';

interface SignInData {
  /** The server said there is no session: the cache belongs to nobody signed in. */
  sessionEnded: boolean;
}

export function signInLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs): Promise<SignInData> => {
    if (!onlineManager.isOnline()) return { sessionEnded: false };
    // Ask the server, not the cache: a cached "me" may belong to a session that just expired.
    try {
      const me = await getMe(request.signal);
      queryClient.setQueryData(meQueryKey, me);
    } catch (error) {
      return { sessionEnded: isUnauthenticated(error) };
    }
    throw redirect(safeNextPath(new URL(request.url).searchParams.get('next')));
  };
}

export function SignInRoute() {
  useDocumentTitle('Sign in');
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const next = safeNextPath(params.get('next'));
  const { sessionEnded } = useLoaderData<SignInData>();
  const queryClient = useQueryClient();
  const online = useOnline();
  useEffect(() => {
    if (sessionEnded) void clearCachedData(queryClient);
  }, [sessionEnded, queryClient]);
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
      {online ? null : (
        <p role="status" className="rounded-panel border-2 border-line-strong bg-sunken p-3">
          This tablet is offline. Signing in needs the network: try again once it returns.
        </p>
      )}
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
