// One step of a finished case, as a learner sees it: its kind and title, its cautions before
// anything else, the question or instruction, what the technician answered or measured with the
// values worked out from it, the photos and the notes. Where it led and why are shown only once
// the step is revealed.
import type { TrainingAnswer, TrainingPhoto, TrainingStep } from '@heatpath/contracts';
import type { ReactNode } from 'react';
import { SafetyNote } from '../../../components/ui/alert';
import { StepCautions } from '../../../components/walk-step/step-cautions';
import { hazardLabels, stepKindLabels } from '../../../lib/step-labels';

function AnswerGiven({ answer, Sub }: { answer: TrainingAnswer; Sub: 'h3' | 'h4' }) {
  if (answer.kind === 'measurement') {
    return (
      <div>
        <Sub className="font-bold">Readings the technician took</Sub>
        {answer.readings.length === 0 ? (
          <p className="text-ink-muted">No readings were entered.</p>
        ) : (
          <dl className="mt-1 grid gap-x-6 gap-y-2 sm:grid-cols-2">
            {answer.readings.map((reading) => (
              <div key={reading.label}>
                <dt className="text-sm text-ink-muted">{reading.label}</dt>
                <dd className="text-lg font-bold">{reading.display}</dd>
              </div>
            ))}
          </dl>
        )}
      </div>
    );
  }
  return (
    <p>
      <span className="font-bold">
        {answer.kind === 'choice' ? 'The technician answered: ' : 'The technician reported: '}
      </span>
      <span className="text-lg">{answer.label}</span>
    </p>
  );
}

export function TrainingPhotos({
  photos,
  Sub = 'h3',
}: {
  photos: readonly TrainingPhoto[];
  Sub?: 'h3' | 'h4';
}) {
  if (photos.length === 0) return null;
  return (
    <div>
      <Sub className="mb-2 font-bold">Photos</Sub>
      <ul className="grid grid-cols-[repeat(auto-fill,minmax(9rem,1fr))] gap-3">
        {photos.map((photo) => (
          <li key={photo.id}>
            <a
              href={photo.url}
              target="_blank"
              rel="noopener"
              className="flex h-full flex-col gap-1 rounded-control border-2 border-line-strong bg-surface p-1.5 hover:bg-sunken"
            >
              <img
                src={photo.thumbnailUrl ?? photo.url}
                alt={photo.name}
                loading="lazy"
                className="aspect-square w-full rounded-[0.375rem] bg-sunken object-cover"
              />
              <span className="truncate text-sm" title={photo.name}>
                <span className="sr-only">Open </span>
                {photo.name}
              </span>
            </a>
          </li>
        ))}
      </ul>
    </div>
  );
}

/** Where the step led and the tree's reason: "what really happened and why". */
export function StepOutcome({ step }: { step: TrainingStep }) {
  if (!step.routeLabel && !step.next && !step.why) return null;
  return (
    <div className="flex flex-col gap-1 rounded-control border-2 border-l-8 border-info-line bg-info-bg p-3 text-info-ink">
      {step.routeLabel || step.next ? (
        <p>
          <span className="font-bold">What happened: </span>
          {step.routeLabel ? <span>{step.routeLabel}</span> : null}
          {step.next ? (
            <span>
              {step.routeLabel ? ' → ' : ''}
              {step.next.kind === 'outcome' ? 'finding: ' : 'next, '}
              <span className="font-semibold">{step.next.title}</span>
            </span>
          ) : null}
        </p>
      ) : null}
      {step.why ? (
        <p>
          <span className="font-bold">Why: </span>
          {step.why}
        </p>
      ) : null}
    </div>
  );
}

interface TrainingStepViewProps {
  step: TrainingStep;
  /** Where the step led and why; left out while the learner still has to predict it. */
  revealed: boolean;
  /** The heading level inside the page (a list of steps nests one deeper). */
  level?: 2 | 3;
  /** Shown under the step's own content, such as the prediction asked or its result. */
  children?: ReactNode;
  headingId?: string;
}

export function TrainingStepView({
  step,
  revealed,
  level = 2,
  children,
  headingId,
}: TrainingStepViewProps) {
  const Heading = level === 2 ? 'h2' : 'h3';
  const Sub = level === 2 ? 'h3' : 'h4';
  const uncovered = step.hazards.filter(
    (hazard) => !step.cautions.some((caution) => caution.hazard === hazard),
  );
  return (
    <article
      aria-labelledby={headingId}
      className="flex flex-col gap-4 rounded-panel border-2 border-line-strong bg-surface p-4 sm:p-6"
    >
      <div className="flex flex-wrap items-baseline gap-x-4 gap-y-1">
        <Heading
          id={headingId}
          className={level === 2 ? 'text-2xl font-bold' : 'text-xl font-bold'}
        >
          {step.title}
        </Heading>
        <p className="font-semibold text-ink-muted">
          Step {step.index + 1} · {stepKindLabels[step.kind]}
        </p>
      </div>
      <StepCautions cautions={step.cautions} />
      {uncovered.length > 0 ? (
        <SafetyNote>
          <p>
            This step has these hazards:{' '}
            {uncovered.map((hazard) => hazardLabels[hazard]).join(', ')}. Follow the maker’s
            procedure.
          </p>
        </SafetyNote>
      ) : null}
      <p className="text-lg" data-testid="training-step-prompt">
        {step.prompt}
      </p>
      <AnswerGiven answer={step.answer} Sub={Sub} />
      {step.computed.length > 0 ? (
        <div>
          <Sub className="font-bold">Worked out from the readings</Sub>
          <dl className="mt-1 grid gap-x-6 gap-y-2 sm:grid-cols-2">
            {step.computed.map((value) => (
              <div key={value.label}>
                <dt className="text-sm text-ink-muted">{value.label}</dt>
                <dd className="text-lg font-bold">{value.display}</dd>
              </div>
            ))}
          </dl>
          <p className="text-sm text-ink-muted">An aid, not the maker’s data.</p>
        </div>
      ) : null}
      <TrainingPhotos photos={step.photos} Sub={Sub} />
      {step.notes.length > 0 ? (
        <div>
          <Sub className="font-bold">The technician’s notes</Sub>
          <ul className="list-disc pl-6">
            {step.notes.map((note, at) => (
              <li key={`${at}-${note}`} className="whitespace-pre-line">
                {note}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      {revealed ? <StepOutcome step={step} /> : null}
      {children}
    </article>
  );
}
