// The frame of the step a walk stands at: a panel named by the step's title, with a line beside
// the title saying where in the walk it is ("Step 3 · Measurement", "✓ Finding reached at step
// 5"). A finding's panel is edged in the "ok" colour.
import type { ReactNode } from 'react';

interface StepFrameProps {
  title: string;
  /** The line beside the title. */
  where: ReactNode;
  finding?: boolean;
  children: ReactNode;
}

export function StepFrame({ title, where, finding = false, children }: StepFrameProps) {
  return (
    <section
      aria-labelledby="current-step-title"
      className={
        'rounded-panel border-2 bg-surface p-4 sm:p-6 ' +
        (finding ? 'border-l-8 border-ok-line' : 'border-line-strong')
      }
    >
      <div className="mb-3 flex flex-wrap items-baseline gap-x-4 gap-y-1">
        <h2 id="current-step-title" className="text-2xl font-bold">
          {title}
        </h2>
        <p className={'font-semibold ' + (finding ? 'text-ok-ink' : 'text-ink-muted')}>{where}</p>
      </div>
      {children}
    </section>
  );
}
