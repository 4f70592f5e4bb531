// The finding the walk reached: its cautions first, then the root cause, the correction, the
// suggested parts and labour and the follow-ups, as the tree states them. The findings the
// technician edits (and the repair order takes) are drafted from this.
import type { OutcomeView } from '@heatpath/fault-tree';
import type { ReactNode } from 'react';
import { CauseAndCorrection, labourLines, OutcomeLines, partLines } from './outcome-lines';
import { StepCautions } from './step-cautions';

interface OutcomeSummaryProps {
  outcome: OutcomeView;
  stepNumber: number;
  children?: ReactNode;
}

export function OutcomeSummary({ outcome, stepNumber, children }: OutcomeSummaryProps) {
  return (
    <section
      aria-labelledby="current-step-title"
      className="rounded-panel border-2 border-l-8 border-ok-line bg-surface p-4 sm:p-6"
    >
      <div className="mb-3 flex flex-wrap items-baseline gap-x-4 gap-y-1">
        <h2 id="current-step-title" className="text-2xl font-bold">
          {outcome.title}
        </h2>
        <p className="font-semibold text-ok-ink">
          <span aria-hidden="true">✓ </span>Finding reached at step {stepNumber}
        </p>
      </div>
      <OutcomeDetails outcome={outcome}>{children}</OutcomeDetails>
    </section>
  );
}

/** The finding's cautions, cause, correction, parts, labour and follow-ups, in two columns. */
export function OutcomeDetails({
  outcome,
  children,
}: {
  outcome: OutcomeView;
  children?: ReactNode;
}) {
  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <div className="flex flex-col gap-4">
        <StepCautions cautions={outcome.cautions} />
        <CauseAndCorrection rootCause={outcome.rootCause} correction={outcome.correction} />
        {outcome.notes ? <p className="text-sm text-ink-muted">{outcome.notes}</p> : null}
      </div>
      <div className="flex flex-col gap-4">
        <OutcomeLines title="Suggested parts" items={partLines(outcome.parts)} />
        <OutcomeLines title="Suggested labour" items={labourLines(outcome.labour)} />
        <OutcomeLines title="Follow-ups" items={outcome.followUps} />
        {children}
      </div>
    </div>
  );
}
