// The cases the lead has marked for training: symptom, finding, difficulty, how often apprentices
// tried it, and whether it is withdrawn; each can be edited, previewed as an apprentice sees it,
// withdrawn (after a confirmation) and put back.
import type { TrainingCaseSummary } from '@heatpath/contracts';
import { useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Badge } from '../../../components/ui/badge';
import { Button, ButtonLink } from '../../../components/ui/button';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { useTrainingCases } from '../api/get-training-cases';
import { useUpdateTrainingCase } from '../api/update-training-case';
import { countText, formatDate } from '../training-format';
import { DifficultyBadge } from './casebook-card';
import { EditTrainingCaseForm } from './edit-training-case-form';

function TrainingCaseRow({ item }: { item: TrainingCaseSummary }) {
  const [editing, setEditing] = useState(false);
  const [confirming, setConfirming] = useState(false);
  const update = useUpdateTrainingCase();
  const headingId = `training-case-${item.id}`;
  const setWithdrawn = (withdrawn: boolean) =>
    update.mutate(
      { trainingCaseId: item.id, changes: { withdrawn } },
      { onSuccess: () => setConfirming(false) },
    );

  return (
    <article
      aria-labelledby={headingId}
      className={
        'flex flex-col gap-3 rounded-panel border-2 p-4 ' +
        (item.withdrawn ? 'border-line bg-sunken' : 'border-line-strong bg-surface')
      }
    >
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div className="flex min-w-0 flex-col gap-0.5">
          <h3 id={headingId} className="text-lg font-bold">
            {item.symptom}
            <span className="sr-only"> ({item.caseReference})</span>
          </h3>
          <p>
            Finding: <span className="font-semibold">{item.outcomeTitle}</span>
          </p>
          <p className="text-sm text-ink-muted">
            {item.caseReference} · {item.treeTitle} · marked by {item.markedBy.name},{' '}
            {formatDate(item.createdAt)}
          </p>
        </div>
        <div className="flex flex-wrap gap-2">
          <DifficultyBadge entry={item} />
          {item.withdrawn ? (
            <Badge>
              <span aria-hidden="true" className="mr-1">
                ■
              </span>
              Withdrawn
            </Badge>
          ) : (
            <Badge tone="ok">
              <span aria-hidden="true" className="mr-1">
                ✓
              </span>
              In the casebook
            </Badge>
          )}
        </div>
      </div>
      <p className="text-sm">
        <span className="font-semibold">{countText(item.attempts, 'attempt', 'attempts')}</span>
        {' · '}
        {item.hideNotes ? 'Technician’s notes hidden' : 'Technician’s notes shown'}
        {' · '}
        {item.hiddenAttachmentIds.length === 0
          ? 'every photo shown'
          : `${countText(item.hiddenAttachmentIds.length, 'photo', 'photos')} hidden`}
      </p>
      {editing ? (
        <EditTrainingCaseForm item={item} onDone={() => setEditing(false)} />
      ) : (
        <>
          <p className="whitespace-pre-line">
            <span className="font-semibold">Teaching note: </span>
            {item.teachingNote}
          </p>
          {update.error ? (
            <Alert tone="danger" role="alert" title="Not changed">
              <p>{update.error.message}</p>
            </Alert>
          ) : null}
          {confirming ? (
            <div className="flex flex-col gap-3 rounded-control border-2 border-caution-line bg-caution-bg p-3 text-caution-ink">
              <p className="font-semibold">
                Apprentices will no longer see this case, and it leaves their courses’ lists. Their
                scores so far are kept.
              </p>
              <div className="flex flex-wrap gap-3">
                <Button
                  variant="danger"
                  busy={update.isPending}
                  busyLabel="Withdrawing…"
                  onClick={() => setWithdrawn(true)}
                >
                  Yes, withdraw {item.caseReference}
                </Button>
                <Button variant="secondary" onClick={() => setConfirming(false)}>
                  Keep it
                </Button>
              </div>
            </div>
          ) : (
            <div className="flex flex-wrap gap-3">
              <Button variant="secondary" onClick={() => setEditing(true)}>
                Edit<span className="sr-only"> {item.caseReference}</span>
              </Button>
              {item.withdrawn ? (
                <Button
                  variant="secondary"
                  busy={update.isPending}
                  busyLabel="Putting back…"
                  onClick={() => setWithdrawn(false)}
                >
                  Put back in the casebook<span className="sr-only"> ({item.caseReference})</span>
                </Button>
              ) : (
                <>
                  <ButtonLink to={`/casebook/${encodeURIComponent(item.id)}/replay`}>
                    See it as an apprentice<span className="sr-only"> ({item.caseReference})</span>
                  </ButtonLink>
                  <Button variant="danger" onClick={() => setConfirming(true)}>
                    Withdraw<span className="sr-only"> {item.caseReference}</span>
                  </Button>
                </>
              )}
            </div>
          )}
        </>
      )}
    </article>
  );
}

export function TrainingCaseList() {
  const cases = useTrainingCases();
  if (cases.isPending) return <LoadingState label="Loading training cases…" />;
  if (cases.isError)
    return (
      <ErrorState
        title="Training cases not loaded"
        message={cases.error.message}
        onRetry={() => void cases.refetch()}
        retrying={cases.isRefetching}
      />
    );
  const list = cases.data.trainingCases;
  if (list.length === 0)
    return (
      <p className="text-ink-muted">
        No case is marked for training yet. Mark a finished case below to put it in the apprentices’
        casebook.
      </p>
    );
  return (
    <ul aria-label="Training cases" className="flex flex-col gap-3">
      {list.map((item) => (
        <li key={item.id}>
          <TrainingCaseRow item={item} />
        </li>
      ))}
    </ul>
  );
}
