// One training case before it is opened: what the learner may know (symptom, complaint, car,
// difficulty, steps) and two ways in — predict each step before it is revealed, or replay the
// case as it happened.
import type { AttemptSummary, CasebookEntry } from '@heatpath/contracts';
import { useNavigate } from 'react-router';
import { Alert } from '../../../components/ui/alert';
import { Button, ButtonLink } from '../../../components/ui/button';
import { PageHeader } from '../../../components/ui/page';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { useCasebook } from '../api/get-casebook';
import { useStartAttempt } from '../api/start-attempt';
import { countText, formatMileageText, scoreText, trainingVehicleName } from '../training-format';
import { DifficultyBadge } from './casebook-card';

interface CasebookCaseProps {
  trainingCaseId: string;
  /** The learner's own attempts at this case, newest first (apprentices only). */
  history?: readonly AttemptSummary[] | undefined;
}

function Facts({ entry }: { entry: CasebookEntry }) {
  const mileage = formatMileageText(entry.vehicle.mileageAtIntake, entry.vehicle.mileageUnit);
  return (
    <dl className="grid gap-x-6 gap-y-3 rounded-panel border-2 border-line bg-surface p-4 sm:p-6 md:grid-cols-[10rem_minmax(0,1fr)]">
      <dt className="font-bold">Complaint</dt>
      <dd className="text-lg">“{entry.complaint}”</dd>
      <dt className="font-bold">Vehicle</dt>
      <dd>
        {trainingVehicleName(entry.vehicle)}
        {entry.vehicle.fuel ? ` · ${entry.vehicle.fuel}` : ''}
        {mileage ? ` · ${mileage} at intake` : ''}
      </dd>
      <dt className="font-bold">Decision tree</dt>
      <dd>{entry.treeTitle}</dd>
      <dt className="font-bold">Steps</dt>
      <dd>{countText(entry.stepCount, 'step', 'steps')}</dd>
      <dt className="font-bold">Your attempts</dt>
      <dd>
        {entry.attempts === 0
          ? 'None yet'
          : `${entry.attempts} · best ${entry.bestScore ? scoreText(entry.bestScore) : 'not finished yet'}`}
      </dd>
    </dl>
  );
}

export function CasebookCase({ trainingCaseId, history }: CasebookCaseProps) {
  const casebook = useCasebook();
  const start = useStartAttempt();
  const navigate = useNavigate();

  if (casebook.isPending) return <LoadingState label="Loading the case…" />;
  if (casebook.isError)
    return (
      <ErrorState
        title="Case not loaded"
        message={casebook.error.message}
        onRetry={() => void casebook.refetch()}
        retrying={casebook.isRefetching}
      />
    );
  const entry = casebook.data.cases.find((candidate) => candidate.id === trainingCaseId);
  if (!entry)
    return (
      <Alert tone="danger" role="alert" title="Not in your casebook">
        <p>This training case is not open to you, or the lead has withdrawn it.</p>
        <div>
          <ButtonLink to="/casebook">Back to the casebook</ButtonLink>
        </div>
      </Alert>
    );
  const unfinished = history?.find(
    (attempt) => attempt.trainingCaseId === trainingCaseId && attempt.status === 'in_progress',
  );

  return (
    <div className="flex flex-col gap-6">
      <PageHeader title={entry.symptom} lead={<DifficultyBadge entry={entry} />} />
      <Facts entry={entry} />
      {start.error ? (
        <Alert tone="danger" role="alert" title="Attempt not started">
          <p>{start.error.message}</p>
        </Alert>
      ) : null}
      <div className="grid gap-4 md:grid-cols-2">
        <section
          aria-labelledby="predict-heading"
          className="flex flex-col gap-3 rounded-panel border-2 border-primary bg-surface p-4 sm:p-6"
        >
          <h2 id="predict-heading" className="text-xl font-bold">
            Predict, then see
          </h2>
          <p className="text-ink-muted">
            Step through the case as the technician met it. Before each step is revealed, choose
            what should come next; at the end, name the root cause. Every right call scores.
          </p>
          <div className="mt-auto flex flex-col gap-3">
            <Button
              size="large"
              busy={start.isPending}
              busyLabel="Starting…"
              onClick={() =>
                start.mutate(trainingCaseId, {
                  onSuccess: (attempt) =>
                    void navigate(`/casebook/attempts/${encodeURIComponent(attempt.id)}`),
                })
              }
            >
              {entry.attempts > 0 ? 'Predict, then see: new attempt' : 'Predict, then see'}
            </Button>
            {unfinished ? (
              <ButtonLink to={`/casebook/attempts/${encodeURIComponent(unfinished.id)}`}>
                Carry on with your unfinished attempt
              </ButtonLink>
            ) : null}
          </div>
        </section>
        <section
          aria-labelledby="replay-heading"
          className="flex flex-col gap-3 rounded-panel border-2 border-line-strong bg-surface p-4 sm:p-6"
        >
          <h2 id="replay-heading" className="text-xl font-bold">
            Replay as it happened
          </h2>
          <p className="text-ink-muted">
            Every step with the answer given, the readings and what they worked out to, the photos
            and the cautions, through to the finding. Not scored.
          </p>
          <div className="mt-auto">
            <ButtonLink
              to={`/casebook/${encodeURIComponent(trainingCaseId)}/replay`}
              size="large"
              className="w-full"
            >
              Replay as it happened
            </ButtonLink>
          </div>
        </section>
      </div>
    </div>
  );
}
