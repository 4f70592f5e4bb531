// Signs out and then hands control back to the caller (the shell sends the person to sign-in).
// With no network the server cannot end the session, and the tablet cannot clear the session
// cookie itself, so the button says so rather than pretending: the next person would otherwise
// find the last one still signed in once the network returns.
import { useId } from 'react';
import { Button } from '../../../components/ui/button';
import { useOnline } from '../../../lib/online';
import { useSignOut } from '../api/sign-out';

export function SignOutButton({ onSignedOut }: { onSignedOut: () => void }) {
  const signOut = useSignOut();
  const online = useOnline();
  const hintId = useId();
  return (
    <>
      <Button
        variant="secondary"
        busy={signOut.isPending}
        busyLabel="Signing out…"
        disabled={!online && !signOut.isPending}
        aria-describedby={online ? undefined : hintId}
        // Even if the server cannot be reached, leave this screen: the local data is already gone.
        onClick={() => signOut.mutate(undefined, { onSettled: onSignedOut })}
      >
        Sign out
      </Button>
      {online ? null : (
        <p id={hintId} className="text-sm text-ink-muted">
          Signing out needs the network. Answers given meanwhile stay on this tablet.
        </p>
      )}
    </>
  );
}
