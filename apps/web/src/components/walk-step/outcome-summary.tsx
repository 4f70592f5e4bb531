// The finding the walk reached: its cautions first, then the root cause, the correction, the
// suggested parts and labour and the follow-ups, as the tree states them. The findings the
// technician edits (and the repair order takes) are drafted from this.
import type { OutcomeView } from '@heatpath/fault-tree';
import type { ReactNode } from 'react';
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
        <div>
          <h3 className="font-bold">Root cause</h3>
          <p className="text-lg">{outcome.rootCause}</p>
        </div>
        <div>
          <h3 className="font-bold">Correction</h3>
          <p>{outcome.correction}</p>
        </div>
        {outcome.notes ? <p className="text-sm text-ink-muted">{outcome.notes}</p> : null}
      </div>
      <div className="flex flex-col gap-4">
        {outcome.parts.length > 0 ? (
          <div>
            <h3 className="font-bold">Suggested parts</h3>
            <ul className="list-disc pl-6">
              {outcome.parts.map((part) => (
                <li key={part.description}>
                  {part.quantity} × {part.description}
                </li>
              ))}
            </ul>
          </div>
        ) : null}
        {outcome.labour.length > 0 ? (
          <div>
            <h3 className="font-bold">Suggested labour</h3>
            <ul className="list-disc pl-6">
              {outcome.labour.map((line) => (
                <li key={line.operation}>
                  {line.operation}: {line.hours} h
                </li>
              ))}
            </ul>
          </div>
        ) : null}
        {outcome.followUps.length > 0 ? (
          <div>
            <h3 className="font-bold">Follow-ups</h3>
            <ul className="list-disc pl-6">
              {outcome.followUps.map((followUp) => (
                <li key={followUp}>{followUp}</li>
              ))}
            </ul>
          </div>
        ) : null}
        {children}
      </div>
    </div>
  );
}
