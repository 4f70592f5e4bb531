// Offers the newer build when it arrives, instead of reloading under the person's hands: what
// was typed is kept (drafts and the outbox survive a reload), but the choice of moment is theirs.
import { Button } from '../../components/ui/button';
import { useUpdateReady } from '../../lib/app-update';

export function UpdateNotice() {
  const ready = useUpdateReady();
  return (
    <div role="status">
      {ready ? (
        <p className="flex flex-wrap items-center gap-3 border-b-2 border-line-strong bg-sunken px-4 py-2 text-sm text-ink">
          <span>
            <span className="font-semibold">A newer Heatpath is ready.</span> Reload when it suits
            you; answers kept on this tablet are not lost.
          </span>
          <Button variant="secondary" onClick={() => window.location.reload()}>
            Reload
          </Button>
        </p>
      ) : null}
    </div>
  );
}
