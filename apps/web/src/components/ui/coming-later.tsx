// An honest placeholder for a capability that is not built yet: it names the capability it waits
// for and offers no controls, so nothing on screen pretends to work.
import type { ReactNode } from 'react';
import { Badge } from './badge';

interface ComingLaterProps {
  /** The capability this depends on, as the product names it ("cases", "decision trees"). */
  capability: string;
  children?: ReactNode;
}

export function ComingLater({ capability, children }: ComingLaterProps) {
  return (
    <div className="flex flex-col gap-3 rounded-panel border-2 border-dashed border-line-strong bg-surface p-4 sm:p-6">
      <div>
        <Badge tone="later">Coming with {capability}</Badge>
      </div>
      {children ? <div className="flex flex-col gap-2 text-ink-muted">{children}</div> : null}
      <p className="text-sm text-ink-muted">Not built yet, so there is nothing to press here.</p>
    </div>
  );
}
