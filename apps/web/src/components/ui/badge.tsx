// Small status labels. The text carries the meaning; the tint only helps the eye find it.
import type { ReactNode } from 'react';

export type BadgeTone = 'neutral' | 'ok' | 'caution' | 'danger' | 'later';

const toneClasses: Record<BadgeTone, string> = {
  neutral: 'bg-sunken border-line-strong text-ink',
  ok: 'bg-ok-bg border-ok-line text-ok-ink',
  caution: 'bg-caution-bg border-caution-line text-caution-ink',
  danger: 'bg-danger-bg border-danger-line text-danger-ink',
  // Dashed: "not built yet" must never look like a working status.
  later: 'bg-transparent border-dashed border-line-strong text-ink-muted',
};

export function Badge({ tone = 'neutral', children }: { tone?: BadgeTone; children: ReactNode }) {
  return (
    <span
      className={`inline-flex items-center rounded-full border-2 px-2.5 py-0.5 text-sm font-semibold ${toneClasses[tone]}`}
    >
      {children}
    </span>
  );
}
