// Changing a training case: the teaching note, the difficulty, and what is hidden. The case's
// notes and photos come from the case itself (the lead may read every case).
import {
  updateTrainingCaseRequestSchema,
  type TrainingCaseSummary,
  type TrainingDifficulty,
} from '@heatpath/contracts';
import { useState, type FormEvent } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextAreaField } from '../../../components/ui/field';
import { SegmentedChoice } from '../../../components/ui/segmented-choice';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { useCase } from '../../../lib/case-query';
import { useUpdateTrainingCase } from '../api/update-training-case';
import { HidingChoices } from './hiding-choices';
import { difficultyChoices } from './mark-case-form';

export function EditTrainingCaseForm({
  item,
  onDone,
}: {
  item: TrainingCaseSummary;
  onDone: () => void;
}) {
  const detail = useCase(item.caseId);
  const update = useUpdateTrainingCase();
  const [teachingNote, setTeachingNote] = useState(item.teachingNote);
  const [difficulty, setDifficulty] = useState<TrainingDifficulty>(item.difficulty);
  const [hideNotes, setHideNotes] = useState(item.hideNotes);
  const [hidden, setHidden] = useState<string[]>(item.hiddenAttachmentIds);
  const [error, setError] = useState<string | undefined>();
  const formId = `edit-training-case-${item.id}`;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = updateTrainingCaseRequestSchema.safeParse({
      teachingNote,
      difficulty,
      hideNotes,
      hiddenAttachmentIds: hidden,
    });
    if (!parsed.success) {
      setError(parsed.error.issues[0]?.message);
      return;
    }
    setError(undefined);
    update.mutate({ trainingCaseId: item.id, changes: parsed.data }, { onSuccess: onDone });
  };

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-labelledby={formId}
      className="flex flex-col gap-4 border-t-2 border-line pt-4"
    >
      <h4 id={formId} className="text-lg font-bold">
        Change {item.caseReference}
      </h4>
      {update.error ? (
        <Alert tone="danger" role="alert" title="Not saved">
          <p>{update.error.message}</p>
        </Alert>
      ) : null}
      <TextAreaField
        label="Teaching note"
        rows={4}
        value={teachingNote}
        onChange={(event) => setTeachingNote(event.target.value)}
        error={error}
      />
      <SegmentedChoice
        legend="Difficulty"
        choices={difficultyChoices}
        value={difficulty}
        onChange={setDifficulty}
      />
      {detail.isPending ? (
        <LoadingState label="Loading the case’s notes and photos…" />
      ) : detail.isError ? (
        <ErrorState
          title="Notes and photos not loaded"
          message={detail.error.message}
          onRetry={() => void detail.refetch()}
          retrying={detail.isRefetching}
        />
      ) : (
        <HidingChoices
          notes={detail.data.notes}
          photos={detail.data.attachments.filter((attachment) => attachment.kind === 'photo')}
          hideNotes={hideNotes}
          hiddenPhotoIds={hidden}
          onHideNotesChange={setHideNotes}
          onHiddenPhotosChange={setHidden}
        />
      )}
      <div className="flex flex-wrap gap-3">
        <Button type="submit" busy={update.isPending} busyLabel="Saving…">
          Save changes
        </Button>
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
