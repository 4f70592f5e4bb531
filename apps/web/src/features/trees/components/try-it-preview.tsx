// "Try it": the draft walked as a technician would walk it, in the browser only — no case is
// created and nothing is sent. It runs the compiled draft through the same fault-tree functions
// the API uses (answers checked, readings converted and ranged, computed values live), and follows
// the draft as it is edited: the answers given so far are replayed on each new version.
import {
  applyWalkEvent,
  compileTree,
  describeWalk,
  replayWalk,
  type CompiledTree,
  type WalkEvent,
  type WalkSnapshot,
  type WalkView,
} from '@heatpath/fault-tree';
import { useEffect, useMemo, useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { MeasurementForm } from '../../../components/walk-step/measurement-form';
import { OutcomeDetails } from '../../../components/walk-step/outcome-summary';
import { ProcedureAnswers } from '../../../components/walk-step/procedure-answers';
import { QuestionAnswers } from '../../../components/walk-step/question-answers';
import { StepCautions } from '../../../components/walk-step/step-cautions';
import type { EditableTree } from '../draft-model';
import { problemCount } from '../tree-format';

interface TryItPreviewProps {
  tree: EditableTree;
  onCurrentChange: (nodeId: string | null) => void;
  onShowProblems: () => void;
}

export function TryItPreview({ tree, onCurrentChange, onShowProblems }: TryItPreviewProps) {
  const compiled = useMemo(() => compileTree(tree), [tree]);
  const [history, setHistory] = useState<WalkEvent[]>([]);
  const [refusal, setRefusal] = useState<string | null>(null);

  const replay = useMemo(
    () => (compiled.ok ? replayWalk(compiled.tree, history) : null),
    [compiled, history],
  );
  const view = useMemo(
    () => (compiled.ok && replay ? describeWalk(compiled.tree, replay.snapshot) : null),
    [compiled, replay],
  );

  const currentId = view?.currentNodeId ?? null;
  useEffect(() => {
    onCurrentChange(currentId);
  }, [currentId, onCurrentChange]);
  useEffect(() => () => onCurrentChange(null), [onCurrentChange]);

  if (!compiled.ok || !replay || !view) {
    return (
      <section aria-label="Try it" className="flex flex-col gap-4">
        <h2 className="text-xl font-bold">Try it</h2>
        <Alert tone="caution" title="Not ready to try yet">
          <p>
            The draft has {problemCount(compiled.problems.length)}. A walk needs a tree that
            compiles clean: fix them first, then try it.
          </p>
          <p>First: {compiled.problems[0]?.message}</p>
          <div>
            <Button variant="secondary" onClick={onShowProblems}>
              Back to editing
            </Button>
          </div>
        </Alert>
      </section>
    );
  }

  const kept = history.slice(0, replay.applied);
  const answer = (event: WalkEvent) => {
    const result = applyWalkEvent(compiled.tree, replay.snapshot, event);
    if (!result.ok) {
      setRefusal(result.rejection.message);
      return;
    }
    setRefusal(null);
    setHistory([...kept, result.event]);
  };

  return (
    <section aria-label="Try it" className="flex flex-col gap-5">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 className="text-xl font-bold">Try it</h2>
        <Badge tone="neutral">Preview — no case is created</Badge>
      </div>
      {replay.divergence ? (
        <Alert tone="info" title="The draft changed under the walk">
          <p>
            The answers were replayed on the new draft up to step {replay.divergence.divergedAt + 1}
            : {replay.divergence.reason}
          </p>
        </Alert>
      ) : null}
      <WalkPathList view={view} />
      <CurrentStep
        key={`${view.currentNodeId}:${view.position}`}
        tree={compiled.tree}
        snapshot={replay.snapshot}
        view={view}
        onAnswer={answer}
      />
      {refusal ? (
        <Alert tone="danger" title="Answer not taken" role="alert">
          <p>{refusal}</p>
        </Alert>
      ) : null}
      <div className="flex flex-wrap gap-3 border-t-2 border-line pt-4">
        <Button
          variant="secondary"
          disabled={!view.canGoBack}
          onClick={() =>
            answer({ type: 'walk.back', nodeId: view.currentNodeId, position: view.position })
          }
        >
          <span aria-hidden="true">←</span> Step back
        </Button>
        <Button
          variant="secondary"
          disabled={history.length === 0}
          onClick={() => {
            setRefusal(null);
            setHistory([]);
          }}
        >
          Start again
        </Button>
      </div>
    </section>
  );
}

function WalkPathList({ view }: { view: WalkView }) {
  if (view.path.length === 0) return null;
  return (
    <ol aria-label="Answers so far" className="flex flex-col gap-1 rounded-control bg-sunken p-3">
      {view.path.map((entry, index) => (
        <li key={`${entry.nodeId}:${index}`}>
          <span className="font-semibold">
            {index + 1}. {entry.title}
          </span>{' '}
          <span aria-hidden="true">—</span>{' '}
          {entry.answer.kind === 'measurement'
            ? entry.answer.readings.map((reading) => reading.display).join(', ')
            : entry.answer.label}
          {entry.answer.kind === 'measurement' && entry.routeLabel ? ` → ${entry.routeLabel}` : ''}
        </li>
      ))}
    </ol>
  );
}

interface CurrentStepProps {
  tree: CompiledTree;
  snapshot: WalkSnapshot;
  view: WalkView;
  onAnswer: (event: WalkEvent) => void;
}

function CurrentStep({ tree, snapshot, view, onAnswer }: CurrentStepProps) {
  const node = view.currentNode;
  const position = view.position;
  return (
    <article
      aria-label="Current step"
      className="flex flex-col gap-4 rounded-panel border-2 border-line-strong bg-surface p-4"
    >
      <p className="text-sm font-semibold text-ink-muted">
        {node.kind === 'outcome' ? 'Finding' : `Step ${view.path.length + 1}`}
      </p>
      <h3 className="text-xl font-bold">{node.title}</h3>
      {node.kind !== 'outcome' ? <StepCautions cautions={node.cautions} /> : null}
      {node.kind !== 'outcome' && node.tools.length > 0 ? (
        <p>
          <span className="font-semibold">Have ready: </span>
          {node.tools.join(', ')}
        </p>
      ) : null}
      {node.kind !== 'outcome' && node.evidence.length > 0 ? (
        <ul className="flex flex-col gap-1">
          {node.evidence.map((item, index) => (
            <li key={index}>
              <span className="font-semibold">
                {item.kind === 'photo' ? 'Photo' : 'Data log'}
                {item.required ? ' (required)' : ''}:{' '}
              </span>
              {item.label}
            </li>
          ))}
        </ul>
      ) : null}

      {node.kind === 'question' ? (
        <>
          <p className="text-lg">{node.prompt}</p>
          <QuestionAnswers node={node} position={position} onAnswer={onAnswer} />
        </>
      ) : node.kind === 'measurement' ? (
        <>
          <p className="text-lg">{node.prompt}</p>
          <MeasurementForm
            node={node}
            position={position}
            model={{ tree, snapshot }}
            onAnswer={onAnswer}
          />
        </>
      ) : node.kind === 'procedure' ? (
        <>
          <p className="text-lg whitespace-pre-line">{node.instruction}</p>
          <p className="text-sm text-ink-muted">About {node.estimatedMinutes} min</p>
          <ProcedureAnswers node={node} position={position} withNote={false} onAnswer={onAnswer} />
        </>
      ) : (
        <OutcomeSummary view={view} />
      )}
    </article>
  );
}

function OutcomeSummary({ view }: { view: WalkView }) {
  const outcome = view.outcome;
  if (!outcome) return null;
  return (
    <div className="flex flex-col gap-3">
      <Alert tone="ok" title="Finding reached">
        <p>The walk ends here; a technician would now write up the repair order.</p>
      </Alert>
      <OutcomeDetails outcome={outcome} />
      {view.computed.some((value) => value.display) ? (
        <section aria-label="Computed values" className="rounded-control bg-sunken p-3">
          <dl className="flex flex-col gap-1">
            {view.computed
              .filter((value) => value.display)
              .map((value) => (
                <div key={value.name} className="flex flex-wrap justify-between gap-x-3">
                  <dt>{value.label}</dt>
                  <dd className="font-bold">{value.display}</dd>
                </div>
              ))}
          </dl>
        </section>
      ) : null}
    </div>
  );
}
