// The page the unlock e-mail opens. Lifting the pause waits for a tap rather than happening on
// load, so a mail program that opens links to check them does not use the link up.
import { Link } from 'react-router';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { useUnlockSignIn } from '../api/unlock-sign-in';

const linkClass = 'font-semibold underline underline-offset-4';

export function UnlockSignIn({ token }: { token: string }) {
  const unlock = useUnlockSignIn();

  if (token === '')
    return (
      <Alert tone="danger" role="alert" title="This link is incomplete">
        <p>Open the link from the e-mail again, or copy all of it into the address bar.</p>
      </Alert>
    );
  if (unlock.isSuccess)
    return (
      <Alert tone="ok" role="status" title="Sign-in is open again">
        <p>{unlock.data.message}</p>
        <p>
          <Link to="/sign-in" className={linkClass}>
            Sign in
          </Link>
        </p>
      </Alert>
    );
  return (
    <div className="flex flex-col gap-5">
      <p>
        Someone typed wrong passwords for your account on a browser you have not signed in on
        before, so sign-in from new browsers was paused. If that was you, lift the pause here.
      </p>
      {unlock.error ? (
        <Alert tone="danger" role="alert" title="Not lifted">
          <p>{unlock.error.message}</p>
          <p>
            The pause also ends by itself after a few minutes, and{' '}
            <Link to="/forgot-password" className={linkClass}>
              choosing a new password
            </Link>{' '}
            lifts it too.
          </p>
        </Alert>
      ) : null}
      <Button
        type="button"
        size="large"
        busy={unlock.isPending}
        busyLabel="Lifting the pause…"
        onClick={() => unlock.mutate({ token })}
      >
        Lift the pause
      </Button>
    </div>
  );
}
