// The end of a training case: the finding the tree reached (root cause and correction), the
// findings the workshop wrote for the repair order, and the lead's teaching note.
import type { TrainingFindings, TrainingOutcome } from '@heatpath/contracts';
import {
  CauseAndCorrection,
  labourLines,
  OutcomeLines,
  partLines,
} from '../../../components/walk-step/outcome-lines';

export function TeachingNote({ note }: { note: string }) {
  return (
    <section
      aria-labelledby="teaching-note-heading"
      className="rounded-panel border-2 border-l-8 border-primary bg-surface p-4 sm:p-6"
    >
      <h2 id="teaching-note-heading" className="mb-2 text-xl font-bold">
        The lead’s teaching note
      </h2>
      <p className="text-lg whitespace-pre-line">{note}</p>
    </section>
  );
}

export function TrainingOutcomeView({
  outcome,
  findings,
}: {
  outcome: TrainingOutcome;
  findings: TrainingFindings | null;
}) {
  return (
    <section
      aria-labelledby="training-outcome-heading"
      className="flex flex-col gap-4 rounded-panel border-2 border-l-8 border-ok-line bg-surface p-4 sm:p-6"
    >
      <div>
        <p className="font-semibold text-ok-ink">
          <span aria-hidden="true">✓ </span>The finding
        </p>
        <h2 id="training-outcome-heading" className="text-2xl font-bold">
          {outcome.title}
        </h2>
      </div>
      <div className="grid gap-4 lg:grid-cols-2">
        <div className="flex flex-col gap-3">
          <CauseAndCorrection rootCause={outcome.rootCause} correction={outcome.correction} />
        </div>
        {findings ? (
          <div className="flex flex-col gap-3">
            <h3 className="text-lg font-bold">What the workshop wrote for the repair order</h3>
            <dl className="grid gap-x-4 gap-y-2 md:grid-cols-[8rem_minmax(0,1fr)]">
              <dt className="font-bold">Concern</dt>
              <dd className="whitespace-pre-line">{findings.concern}</dd>
              <dt className="font-bold">Cause</dt>
              <dd className="whitespace-pre-line">{findings.cause}</dd>
              <dt className="font-bold">Correction</dt>
              <dd className="whitespace-pre-line">{findings.correction}</dd>
            </dl>
            <OutcomeLines Heading="h4" title="Parts" items={partLines(findings.parts)} />
            <OutcomeLines Heading="h4" title="Labour" items={labourLines(findings.labour)} />
            <OutcomeLines Heading="h4" title="Follow-ups" items={findings.followUps} />
          </div>
        ) : (
          <div className="flex flex-col gap-3">
            <OutcomeLines Heading="h4" title="Suggested parts" items={partLines(outcome.parts)} />
            <OutcomeLines
              Heading="h4"
              title="Suggested labour"
              items={labourLines(outcome.labour)}
            />
            <OutcomeLines Heading="h4" title="Follow-ups" items={outcome.followUps} />
          </div>
        )}
      </div>
    </section>
  );
}
