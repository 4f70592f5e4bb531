// A plain line at the top of the signed-in frame while the tablet has no network: the person
// keeps working, so it informs rather than warns. The live region stays in the page, so a screen
// reader hears the line when it appears.
import { useOnline } from '../../lib/online';

export function OfflineNotice() {
  const online = useOnline();
  return (
    <div role="status">
      {online ? null : (
        <p className="border-b-2 border-line-strong bg-sunken px-4 py-2 text-sm text-ink">
          <span className="font-semibold">Offline</span> — answers are kept on this tablet and sent
          when the network returns.
        </p>
      )}
    </div>
  );
}
