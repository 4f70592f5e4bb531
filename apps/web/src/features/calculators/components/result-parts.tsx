// The pieces every calculator result is built from: the headline figure, a verdict, the details,
// the package's warnings, and where each figure comes from.
import type { CoolantWarning, SourceNote } from '@heatpath/coolant';
import type { ReactNode } from 'react';
import { Alert, type AlertTone } from '../../../components/ui/alert';
import type { Calculation } from '../calculation';

interface ResultPanelProps {
  calculation: Calculation<unknown>;
  /** Rendered once the computation succeeded. */
  children: ReactNode;
  /** Cautions that apply whatever the figures say; always shown. */
  cautions: ReactNode;
  /** Shown in place of the result while something blocks it (an unknown glycol, say). */
  blocked?: ReactNode;
}

export function ResultPanel({ calculation, children, cautions, blocked }: ResultPanelProps) {
  return (
    <section
      aria-labelledby="result-heading"
      className="flex flex-col gap-4 rounded-panel border-2 border-line-strong bg-surface p-4 sm:p-6"
    >
      <h2 id="result-heading" className="text-xl font-bold">
        Result
      </h2>
      {/* Polite: the figure changes as the person types and must not interrupt them. */}
      <div aria-live="polite" className="flex flex-col gap-4">
        {blocked ? (
          blocked
        ) : calculation.state === 'waiting' ? (
          <p className="text-ink-muted">
            Enter {joinLabels(calculation.missing)} to see the result.
          </p>
        ) : calculation.state === 'refused' ? (
          <Alert tone="danger" title="No result for these readings">
            <p>{calculation.message}</p>
          </Alert>
        ) : (
          children
        )}
      </div>
      <div className="flex flex-col gap-3">{cautions}</div>
    </section>
  );
}

function joinLabels(labels: readonly string[]): string {
  const lower = labels.map((label) => label.toLowerCase());
  if (lower.length <= 1) return lower.join('');
  return `${lower.slice(0, -1).join(', ')} and ${lower.at(-1) ?? ''}`;
}

/** The one figure the person came for, large enough to read from the engine bay. */
export function Headline({
  label,
  value,
  note,
}: {
  label: string;
  value: string;
  note?: ReactNode;
}) {
  return (
    <div className="flex flex-col gap-1">
      <p className="font-semibold text-ink-muted">{label}</p>
      <p className="text-figure font-bold tracking-tight">{value}</p>
      {note ? <div className="text-ink-muted">{note}</div> : null}
    </div>
  );
}

export type VerdictTone = 'ok' | 'caution' | 'danger';

const verdictIcons: Record<VerdictTone, string> = { ok: '✓', caution: '!', danger: '✕' };
const verdictClasses: Record<VerdictTone, string> = {
  ok: 'bg-ok-bg border-ok-line text-ok-ink',
  caution: 'bg-caution-bg border-caution-line text-caution-ink',
  danger: 'bg-danger-bg border-danger-line text-danger-ink',
};

/** A verdict in words, with an icon and border so it never rests on colour alone. */
export function Verdict({ tone, label }: { tone: VerdictTone; label: string }) {
  return (
    <p
      className={`flex items-center gap-3 rounded-panel border-2 border-l-8 px-4 py-3 text-lg font-bold ${verdictClasses[tone]}`}
    >
      <span
        aria-hidden="true"
        className="flex size-8 shrink-0 items-center justify-center rounded-full border-2 border-current"
      >
        {verdictIcons[tone]}
      </span>
      <span>
        <span className="sr-only">Verdict: </span>
        {label}
      </span>
    </p>
  );
}

export function Details({ rows }: { rows: readonly { term: string; value: string }[] }) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
      {rows.map((row) => (
        <div key={row.term} className="contents">
          <dt className="text-ink-muted">{row.term}</dt>
          <dd className="font-semibold">{row.value}</dd>
        </div>
      ))}
    </dl>
  );
}

export function Warnings({ warnings }: { warnings: readonly CoolantWarning[] }) {
  if (warnings.length === 0) return null;
  return (
    <ul className="flex flex-col gap-2">
      {warnings.map((warning) => (
        <li key={warning.code}>
          <Alert tone={warningTone(warning)} title="Check this">
            <p>{warning.message}</p>
          </Alert>
        </li>
      ))}
    </ul>
  );
}

function warningTone(warning: CoolantWarning): AlertTone {
  // A rise in a cold hold means the system is still warming: repeat the test, not an alarm.
  return warning.code === 'over-concentrated' ? 'danger' : 'caution';
}

/** How a figure was reached, in the package's own words. */
export function Rule({ text }: { text: string }) {
  return (
    <div className="flex flex-col gap-1">
      <h3 className="font-semibold">How this is judged</h3>
      <p className="text-ink-muted">{text}</p>
    </div>
  );
}

/** Where the figures come from and how far each source can be trusted. */
export function Sources({ sources }: { sources: readonly SourceNote[] }) {
  const unique = sources.filter(
    (note, index) => sources.findIndex((other) => other.source === note.source) === index,
  );
  return (
    <div className="flex flex-col gap-2 border-t-2 border-line pt-3">
      <h3 className="font-semibold">Where these figures come from</h3>
      <ul className="flex flex-col gap-2">
        {unique.map((note) => (
          <li key={note.source} className="flex flex-col">
            <span>{note.source}</span>
            <span className="text-sm text-ink-muted">Standing: {note.status}</span>
          </li>
        ))}
      </ul>
      <p className="text-sm text-ink-muted">
        An aid, not the maker’s data: the vehicle maker’s specifications always govern.
      </p>
    </div>
  );
}
