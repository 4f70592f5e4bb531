// The finding the walk reached: its cautions first, then the root cause, the correction, the
// suggested parts and labour and the follow-ups, as the tree states them. The findings the
// technician edits (and the repair order takes) are drafted from this.
import type { OutcomeView } from '@heatpath/fault-tree';
import type { ReactNode } from 'react';
import { CauseAndCorrection, labourLines, OutcomeLines, partLines } from './outcome-lines';
import { StepCautions } from './step-cautions';
import { StepFrame } from './step-frame';

interface OutcomeSummaryProps {
  outcome: OutcomeView;
  stepNumber: number;
  children?: ReactNode;
}

export function OutcomeSummary({ outcome, stepNumber, children }: OutcomeSummaryProps) {
  return (
    <StepFrame
      title={outcome.title}
      where={
        <>
          <span aria-hidden="true">✓ </span>Finding reached at step {stepNumber}
        </>
      }
      finding
    >
      <OutcomeDetails outcome={outcome}>{children}</OutcomeDetails>
    </StepFrame>
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
