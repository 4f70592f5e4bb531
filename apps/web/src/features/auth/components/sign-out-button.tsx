// Signs out and then hands control back to the caller (the shell sends the person to sign-in).
import { Button } from '../../../components/ui/button';
import { useSignOut } from '../api/sign-out';

export function SignOutButton({ onSignedOut }: { onSignedOut: () => void }) {
  const signOut = useSignOut();
  return (
    <Button
      variant="secondary"
      busy={signOut.isPending}
      busyLabel="Signing out…"
      // Even if the server cannot be reached, leave this screen: the local data is already gone.
      onClick={() => signOut.mutate(undefined, { onSettled: onSignedOut })}
    >
      Sign out
    </Button>
  );
}
