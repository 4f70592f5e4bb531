// "Mark a finished case for training": choose one of the workshop's finished cases, write the
// teaching note, say how hard it is, and choose whether the technician's notes and each photo are
// shown. The rules are the contract's; the API's refusals come back beside the field they name.
import {
  markTrainingCaseRequestSchema,
  trainingDifficulties,
  trainingDifficultyLabels,
  type TrainingCandidate,
  type TrainingDifficulty,
} from '@heatpath/contracts';
import { useState, type FormEvent } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { FieldError, TextAreaField } from '../../../components/ui/field';
import { SegmentedChoice } from '../../../components/ui/segmented-choice';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { isApiError } from '../../../lib/api-client';
import { useCandidates } from '../api/get-candidates';
import { useMarkTrainingCase } from '../api/mark-training-case';
import { formatDate } from '../training-format';
import { AlwaysHiddenNote, HidingChoices } from './hiding-choices';

type Field = 'caseId' | 'teachingNote' | 'difficulty' | 'hiddenAttachmentIds';
type Errors = Partial<Record<Field, string>>;

export const difficultyChoices = trainingDifficulties.map((value) => ({
  value,
  label: trainingDifficultyLabels[value],
}));

function CandidateChoice({
  candidate,
  checked,
  onChoose,
}: {
  candidate: TrainingCandidate;
  checked: boolean;
  onChoose: () => void;
}) {
  return (
    <label
      className={
        'flex cursor-pointer gap-3 rounded-control border-2 p-3 ' +
        'has-focus-visible:outline-3 has-focus-visible:outline-focus ' +
        (checked ? 'border-primary bg-sunken' : 'border-line-strong bg-surface hover:bg-sunken')
      }
    >
      <input
        type="radio"
        name="training-candidate"
        value={candidate.caseId}
        checked={checked}
        onChange={onChoose}
        aria-label={`${candidate.reference}: ${candidate.treeTitle}`}
        className="mt-1 size-6 shrink-0 accent-primary"
      />
      <span className="flex min-w-0 flex-col gap-0.5">
        <span className="font-bold">
          {candidate.reference} · {candidate.treeTitle}
        </span>
        <span>
          Finding: <span className="font-semibold">{candidate.outcomeTitle}</span>
        </span>
        <span className="text-sm text-ink-muted">
          {candidate.vehicle}
          {candidate.diagnosedAt ? ` · diagnosed ${formatDate(candidate.diagnosedAt)}` : ''} ·{' '}
          {candidate.photos.length} {candidate.photos.length === 1 ? 'photo' : 'photos'},{' '}
          {candidate.notes.length} {candidate.notes.length === 1 ? 'note' : 'notes'}
        </span>
        <span className="text-sm text-ink-muted">“{candidate.complaint}”</span>
      </span>
    </label>
  );
}

export function MarkCaseForm() {
  const candidates = useCandidates();
  const mark = useMarkTrainingCase();
  const [caseId, setCaseId] = useState('');
  const [teachingNote, setTeachingNote] = useState('');
  const [difficulty, setDifficulty] = useState<TrainingDifficulty | ''>('');
  const [hideNotes, setHideNotes] = useState(false);
  const [hidden, setHidden] = useState<string[]>([]);
  const [errors, setErrors] = useState<Errors>({});
  const [marked, setMarked] = useState<string | null>(null);

  const chosen = candidates.data?.cases.find((candidate) => candidate.caseId === caseId);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    setMarked(null);
    const parsed = markTrainingCaseRequestSchema.safeParse({
      caseId,
      teachingNote,
      difficulty: difficulty === '' ? undefined : difficulty,
      hideNotes,
      // Only photos of the chosen case, in case the choice changed after ticking.
      hiddenAttachmentIds: hidden.filter((id) => chosen?.photos.some((photo) => photo.id === id)),
    });
    if (!parsed.success) {
      const next: Errors = {};
      for (const issue of parsed.error.issues) {
        const field = issue.path[0] as Field | undefined;
        if (field && !next[field]) next[field] = issue.message;
      }
      setErrors(next);
      return;
    }
    setErrors({});
    mark.mutate(parsed.data, {
      onSuccess: (summary) => {
        setMarked(
          `${summary.caseReference} (“${summary.symptom}”) is in the apprentices’ casebook now.`,
        );
        setCaseId('');
        setTeachingNote('');
        setDifficulty('');
        setHideNotes(false);
        setHidden([]);
      },
      onError: (error) => {
        if (!isApiError(error)) return;
        const next: Errors = {};
        for (const [field, message] of Object.entries(error.fields)) {
          if (['caseId', 'teachingNote', 'difficulty', 'hiddenAttachmentIds'].includes(field))
            next[field as Field] = message;
        }
        setErrors(next);
      },
    });
  };

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-labelledby="mark-case-heading"
      className="flex flex-col gap-5"
    >
      <h2 id="mark-case-heading" className="text-xl font-bold">
        Mark a finished case for training
      </h2>
      <AlwaysHiddenNote />
      {marked ? (
        <Alert tone="ok" role="status" title="Marked for training">
          <p>{marked}</p>
        </Alert>
      ) : null}
      {mark.error ? (
        <Alert tone="danger" role="alert" title="Not marked">
          <p>{mark.error.message}</p>
        </Alert>
      ) : null}

      <fieldset
        className="flex flex-col gap-3"
        aria-describedby={errors.caseId ? 'mark-case-error' : undefined}
      >
        <legend className="mb-1 text-lg font-bold">Finished case</legend>
        {candidates.isPending ? (
          <LoadingState label="Loading finished cases…" />
        ) : candidates.isError ? (
          <ErrorState
            title="Finished cases not loaded"
            message={candidates.error.message}
            onRetry={() => void candidates.refetch()}
            retrying={candidates.isRefetching}
          />
        ) : candidates.data.cases.length === 0 ? (
          <p className="text-ink-muted">
            Every finished case is marked already. A case can be marked once it is diagnosed.
          </p>
        ) : (
          <ul className="flex max-h-[28rem] flex-col gap-2 overflow-y-auto">
            {candidates.data.cases.map((candidate) => (
              <li key={candidate.caseId}>
                <CandidateChoice
                  candidate={candidate}
                  checked={candidate.caseId === caseId}
                  onChoose={() => {
                    setCaseId(candidate.caseId);
                    setHidden([]);
                    setErrors((current) => ({ ...current, caseId: undefined }));
                  }}
                />
              </li>
            ))}
          </ul>
        )}
        {errors.caseId ? <FieldError id="mark-case-error" message={errors.caseId} /> : null}
      </fieldset>

      <TextAreaField
        label="Teaching note"
        hint="What should an apprentice take from this case? Shown to them at the end."
        rows={4}
        value={teachingNote}
        onChange={(event) => setTeachingNote(event.target.value)}
        error={errors.teachingNote}
      />

      <div className="flex flex-col gap-1.5">
        <SegmentedChoice<TrainingDifficulty | ''>
          legend="Difficulty"
          choices={difficultyChoices}
          value={difficulty}
          onChange={(value) => {
            setDifficulty(value);
            setErrors((current) => ({ ...current, difficulty: undefined }));
          }}
        />
        {errors.difficulty ? (
          <FieldError id="mark-difficulty-error" message={errors.difficulty} />
        ) : null}
      </div>

      {chosen ? (
        <HidingChoices
          notes={chosen.notes}
          photos={chosen.photos}
          hideNotes={hideNotes}
          hiddenPhotoIds={hidden}
          onHideNotesChange={setHideNotes}
          onHiddenPhotosChange={setHidden}
        />
      ) : (
        <p className="text-ink-muted">
          Choose a case to see its notes and photos and what to hide.
        </p>
      )}
      {errors.hiddenAttachmentIds ? (
        <FieldError id="mark-photos-error" message={errors.hiddenAttachmentIds} />
      ) : null}

      <div>
        <Button type="submit" size="large" busy={mark.isPending} busyLabel="Marking…">
          Mark for training
        </Button>
      </div>
    </form>
  );
}
