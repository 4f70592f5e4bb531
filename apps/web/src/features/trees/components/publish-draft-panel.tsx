// Check and publish: replay the tree's finished cases against the draft, choose the cases that
// guard the tree, and publish with a change note. A publish that would change the finding of a
// guarding case stops and shows those cases; only an explicit "Publish anyway" goes ahead, and
// the API records that confirmation with the version.
import type { RegressionReport, TreeVersionDetail } from '@heatpath/contracts';
import { useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button, ButtonLink } from '../../../components/ui/button';
import { TextAreaField } from '../../../components/ui/field';
import { Panel } from '../../../components/ui/page';
import { isApiError, type ApiError } from '../../../lib/api-client';
import { usePublishDraft } from '../api/publish-draft';
import { useReplayRegression } from '../api/replay-regression';
import { useSetRegressionSet } from '../api/set-regression-set';
import { isVerdict, problemCount, verdictWords } from '../tree-format';
import { RegressionTable, VerdictBadge } from './regression-table';

interface PublishDraftPanelProps {
  treeId: string;
  title: string;
  draft: TreeVersionDetail;
  regressionCaseIds: readonly string[];
  onPublished: (version: number) => void;
  onReloadDraft: () => void;
}

type Refusal =
  | { kind: 'stale'; message: string }
  | { kind: 'problems'; message: string; problems: string[] }
  | { kind: 'changed'; message: string; cases: { reference: string; verdict: string }[] }
  | { kind: 'other'; message: string };

// The API answers every refusal with 409 "conflict"; which one it is shows in its fields:
// none for a stale revision, "<step>.<n>" keys for problems, case references for changed findings.
function refusalOf(error: ApiError): Refusal {
  if (error.status !== 409) return { kind: 'other', message: error.message };
  const entries = Object.entries(error.fields);
  if (entries.length === 0) return { kind: 'stale', message: error.message };
  if (entries.every(([key]) => /^[a-z][a-z0-9-]*\.\d+$/.test(key))) {
    return { kind: 'problems', message: error.message, problems: entries.map(([, text]) => text) };
  }
  return {
    kind: 'changed',
    message: error.message,
    cases: entries.map(([reference, verdict]) => ({ reference, verdict })),
  };
}

export function PublishDraftPanel({
  treeId,
  title,
  draft,
  regressionCaseIds,
  onPublished,
  onReloadDraft,
}: PublishDraftPanelProps) {
  const replay = useReplayRegression();
  const saveSet = useSetRegressionSet();
  const publish = usePublishDraft();
  const [chosen, setChosen] = useState<ReadonlySet<string>>(() => new Set(regressionCaseIds));
  const [setSaved, setSetSaved] = useState<number | null>(null);
  const [changeNote, setChangeNote] = useState('');
  const [noteError, setNoteError] = useState<string | undefined>();
  const [refusal, setRefusal] = useState<Refusal | null>(null);

  const report: RegressionReport | undefined = replay.data;
  const hasProblems = draft.problems.length > 0;
  const savedSet = new Set(regressionCaseIds);
  const setChanged =
    chosen.size !== savedSet.size || [...chosen].some((caseId) => !savedSet.has(caseId));

  const send = (confirmChangedOutcomes: boolean) => {
    if (changeNote.trim().length < 3) {
      setNoteError('Say in a few words what changed.');
      return;
    }
    setNoteError(undefined);
    setRefusal(null);
    publish.mutate(
      {
        treeId,
        request: {
          revision: draft.revision,
          changeNote: changeNote.trim(),
          confirmChangedOutcomes,
        },
      },
      {
        onSuccess: (published) => onPublished(published.version),
        onError: (error) => {
          const next = isApiError(error)
            ? refusalOf(error)
            : { kind: 'other' as const, message: 'The draft was not published.' };
          setRefusal(next);
          // The refusal names the cases; the replay says what each now reaches.
          if (next.kind === 'changed' && !replay.data && !replay.isPending) replay.mutate(treeId);
        },
      },
    );
  };

  const detailFor = (reference: string) =>
    report?.results.find((result) => result.reference === reference);

  return (
    <div className="flex flex-col gap-6">
      {hasProblems ? (
        <Alert tone="danger" title={`The draft has ${problemCount(draft.problems.length)}`}>
          <p>A draft with problems is kept, but it cannot be replayed or published.</p>
          <ul className="list-disc pl-6">
            {draft.problems.slice(0, 8).map((problem, index) => (
              <li key={index}>{problem.message}</li>
            ))}
          </ul>
          <div>
            <ButtonLink to={`/trees/${treeId}/draft`}>Fix them in the editor</ButtonLink>
          </div>
        </Alert>
      ) : null}

      <Panel labelledBy="replay-heading">
        <div className="flex flex-col gap-4">
          <h2 id="replay-heading" className="text-xl font-bold">
            Replay finished cases
          </h2>
          <p className="text-ink-muted">
            The recorded answers of every diagnosed or closed case of “{title}”, from any version,
            are walked again on this draft. Nothing is changed by a replay.
          </p>
          <div>
            <Button
              variant="secondary"
              onClick={() => replay.mutate(treeId)}
              busy={replay.isPending}
              busyLabel="Replaying…"
              disabled={hasProblems}
            >
              Replay finished cases
            </Button>
          </div>
          {replay.isError ? (
            <Alert tone="danger" title="Cases not replayed" role="alert">
              <p>{replay.error.message}</p>
            </Alert>
          ) : null}
          {report ? (
            report.results.length === 0 ? (
              <p>No finished cases of this tree yet, so there is nothing to replay.</p>
            ) : (
              <>
                <p aria-live="polite">
                  {(['same-outcome', 'different-outcome', 'no-outcome', 'diverged'] as const)
                    .filter((verdict) => report.summary[verdict] > 0)
                    .map((verdict) => `${verdictWords[verdict]}: ${report.summary[verdict]}`)
                    .join(' · ')}
                </p>
                <RegressionTable
                  report={report}
                  chosen={chosen}
                  onToggle={(caseId, on) => {
                    setSetSaved(null);
                    setChosen((before) => {
                      const next = new Set(before);
                      if (on) next.add(caseId);
                      else next.delete(caseId);
                      return next;
                    });
                  }}
                />
                <div className="flex flex-wrap items-center gap-3">
                  <Button
                    variant="secondary"
                    disabled={!setChanged}
                    busy={saveSet.isPending}
                    busyLabel="Saving…"
                    onClick={() =>
                      saveSet.mutate(
                        { treeId, caseIds: [...chosen] },
                        { onSuccess: (result) => setSetSaved(result.caseIds.length) },
                      )
                    }
                  >
                    Save regression set
                  </Button>
                  <span role="status">
                    {setSaved !== null
                      ? `Saved: ${setSaved} case${setSaved === 1 ? '' : 's'} guard this tree.`
                      : setChanged
                        ? 'Not saved yet.'
                        : `${savedSet.size} case${savedSet.size === 1 ? '' : 's'} guard this tree.`}
                  </span>
                </div>
                {saveSet.isError ? (
                  <Alert tone="danger" title="Regression set not saved" role="alert">
                    <p>{saveSet.error.message}</p>
                  </Alert>
                ) : null}
                <p className="text-sm text-ink-muted">
                  Cases that guard the tree are replayed before every publish; a publish that
                  changes one of their findings asks you to confirm.
                </p>
              </>
            )
          ) : null}
        </div>
      </Panel>

      <Panel labelledBy="publish-heading">
        <form
          noValidate
          className="flex flex-col gap-4"
          onSubmit={(event) => {
            event.preventDefault();
            send(false);
          }}
        >
          <h2 id="publish-heading" className="text-xl font-bold">
            Publish version {draft.version}
          </h2>
          <p className="text-ink-muted">
            New cases start on the published version; cases already open stay on the version they
            started with. A published version can never be changed, only retired.
          </p>
          <TextAreaField
            label="Change note"
            hint="What changed and why, for whoever reads the versions later."
            value={changeNote}
            maxLength={2000}
            error={noteError}
            onChange={(event) => setChangeNote(event.target.value)}
          />
          <div>
            <Button
              type="submit"
              size="large"
              disabled={hasProblems}
              busy={publish.isPending}
              busyLabel="Publishing…"
            >
              Publish
            </Button>
          </div>
        </form>
      </Panel>

      {refusal?.kind === 'changed' ? (
        <Alert tone="caution" title="Publishing changes findings of guarding cases" role="alert">
          <p>{refusal.message}</p>
          <ul className="flex flex-col gap-2">
            {refusal.cases.map(({ reference, verdict }) => {
              const detail = detailFor(reference);
              return (
                <li key={reference} className="flex flex-wrap items-center gap-2">
                  <span className="font-bold">{reference}</span>
                  {isVerdict(verdict) ? <VerdictBadge verdict={verdict} /> : <span>{verdict}</span>}
                  {detail ? (
                    <span>
                      {detail.expectedOutcomeTitle ?? '—'} →{' '}
                      {detail.divergence
                        ? `stops at “${detail.divergence.nodeTitle ?? detail.divergence.nodeId}”: ${detail.divergence.reason}`
                        : (detail.newOutcomeTitle ?? 'no finding')}
                    </span>
                  ) : null}
                </li>
              );
            })}
          </ul>
          <p>
            Publish only if the new findings are what the tree should now reach. Your confirmation
            is stored with the version.
          </p>
          <div className="flex flex-wrap gap-3">
            <Button
              variant="danger"
              onClick={() => send(true)}
              busy={publish.isPending}
              busyLabel="Publishing…"
            >
              Publish anyway
            </Button>
            <Button variant="secondary" onClick={() => setRefusal(null)}>
              Do not publish
            </Button>
          </div>
        </Alert>
      ) : refusal?.kind === 'problems' ? (
        <Alert tone="danger" title="Not published: the draft has problems" role="alert">
          <p>{refusal.message}</p>
          <ul className="list-disc pl-6">
            {refusal.problems.map((text, index) => (
              <li key={index}>{text}</li>
            ))}
          </ul>
        </Alert>
      ) : refusal?.kind === 'stale' ? (
        <Alert tone="danger" title="Not published: the draft changed" role="alert">
          <p>{refusal.message}</p>
          <div>
            <Button
              variant="secondary"
              onClick={() => {
                setRefusal(null);
                onReloadDraft();
              }}
            >
              Reload the draft
            </Button>
          </div>
        </Alert>
      ) : refusal ? (
        <Alert tone="danger" title="Not published" role="alert">
          <p>{refusal.message}</p>
        </Alert>
      ) : null}
    </div>
  );
}
