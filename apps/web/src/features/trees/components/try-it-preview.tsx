// "Try it": the draft walked as a technician would walk it, in the browser only — no case is
// created and nothing is sent. It runs the compiled draft through the same fault-tree functions
// the API uses (answers checked, readings converted and ranged, computed values live), and follows
// the draft as it is edited: the answers given so far are replayed on each new version.
import {
  applyWalkEvent,
  compileTree,
  describeWalk,
  formatNumber,
  formatWithUnit,
  fromCanonical,
  previewReadings,
  replayWalk,
  type CompiledTree,
  type MeasurementInput,
  type MeasurementNode,
  type Reading,
  type UnitCode,
  type WalkEvent,
  type WalkSnapshot,
  type WalkView,
} from '@heatpath/fault-tree';
import { useEffect, useMemo, useState } from 'react';
import { Alert, SafetyNote } from '../../../components/ui/alert';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import type { EditableTree } from '../draft-model';
import { hazardLabels, problemCount, readNumber } from '../tree-format';
import { entryUnitOptions } from '../units-format';

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
      {node.cautions.length > 0 ? (
        <SafetyNote>
          <ul className="flex flex-col gap-2">
            {node.cautions.map((caution, index) => (
              <li key={index}>
                <span className="font-bold">{hazardLabels[caution.hazard]}. </span>
                {caution.text}
              </li>
            ))}
          </ul>
        </SafetyNote>
      ) : null}
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
          <div role="group" aria-label="Answers" className="grid gap-3">
            {node.choices.map((choice) => (
              <Button
                key={choice.id}
                variant="secondary"
                size="large"
                className="justify-start text-left"
                onClick={() =>
                  onAnswer({
                    type: 'answer.choice',
                    nodeId: node.id,
                    position,
                    choiceId: choice.id,
                  })
                }
              >
                {choice.label}
              </Button>
            ))}
          </div>
        </>
      ) : node.kind === 'measurement' ? (
        <PreviewReadings
          tree={tree}
          snapshot={snapshot}
          node={node}
          position={position}
          onAnswer={onAnswer}
        />
      ) : node.kind === 'procedure' ? (
        <>
          <p className="text-lg whitespace-pre-line">{node.instruction}</p>
          <p className="text-sm text-ink-muted">About {node.estimatedMinutes} min</p>
          <div className="grid gap-3 sm:grid-cols-2">
            {node.done ? (
              <Button
                size="large"
                onClick={() =>
                  onAnswer({ type: 'answer.procedure', nodeId: node.id, position, result: 'done' })
                }
              >
                Done
              </Button>
            ) : null}
            {node.couldNotDo ? (
              <Button
                size="large"
                variant="secondary"
                onClick={() =>
                  onAnswer({
                    type: 'answer.procedure',
                    nodeId: node.id,
                    position,
                    result: 'could-not-do',
                  })
                }
              >
                Could not do
              </Button>
            ) : null}
          </div>
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
      <dl className="flex flex-col gap-3">
        <div>
          <dt className="font-semibold">Cause</dt>
          <dd>{outcome.rootCause}</dd>
        </div>
        <div>
          <dt className="font-semibold">Correction</dt>
          <dd>{outcome.correction}</dd>
        </div>
        {outcome.parts.length > 0 ? (
          <div>
            <dt className="font-semibold">Parts</dt>
            <dd>
              <ul>
                {outcome.parts.map((part, index) => (
                  <li key={index}>
                    {formatNumber(part.quantity)} × {part.description}
                  </li>
                ))}
              </ul>
            </dd>
          </div>
        ) : null}
        {outcome.labour.length > 0 ? (
          <div>
            <dt className="font-semibold">Labour</dt>
            <dd>
              <ul>
                {outcome.labour.map((line, index) => (
                  <li key={index}>
                    {line.operation}: {formatNumber(line.hours)} h
                  </li>
                ))}
              </ul>
            </dd>
          </div>
        ) : null}
        {outcome.followUps.length > 0 ? (
          <div>
            <dt className="font-semibold">Follow-ups</dt>
            <dd>
              <ul className="list-disc pl-6">
                {outcome.followUps.map((followUp, index) => (
                  <li key={index}>{followUp}</li>
                ))}
              </ul>
            </dd>
          </div>
        ) : null}
      </dl>
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

function allowedRange(input: MeasurementInput, unit: UnitCode): string {
  const min = fromCanonical(input.range.min, unit, input.quantity);
  const max = fromCanonical(input.range.max, unit, input.quantity);
  return `Allowed ${formatNumber(min)} to ${formatWithUnit(max, unit)}`;
}

function PreviewReadings({
  tree,
  snapshot,
  node,
  position,
  onAnswer,
}: {
  tree: CompiledTree;
  snapshot: WalkSnapshot;
  node: MeasurementNode & { id: string };
  position: number;
  onAnswer: (event: WalkEvent) => void;
}) {
  const [typed, setTyped] = useState<Record<string, string>>({});
  const [units, setUnits] = useState<Record<string, UnitCode>>(() =>
    Object.fromEntries(node.inputs.map((input) => [input.name, input.unit])),
  );
  const [tried, setTried] = useState(false);

  const readings = useMemo(() => {
    const entered: Record<string, Reading> = {};
    for (const input of node.inputs) {
      const value = readNumber(typed[input.name] ?? '');
      const unit = units[input.name] ?? input.unit;
      if (value !== null && !Number.isNaN(value)) entered[input.name] = { value, unit };
    }
    return entered;
  }, [node.inputs, typed, units]);
  const preview = useMemo(
    () => previewReadings(tree, snapshot, readings),
    [tree, snapshot, readings],
  );
  const next = preview.toNodeId ? tree.nodes.get(preview.toNodeId) : undefined;
  const live = preview.computed.filter((value) => value.display !== null);

  return (
    <form
      noValidate
      aria-label="Readings"
      className="flex flex-col gap-4"
      onSubmit={(event) => {
        event.preventDefault();
        setTried(true);
        if (
          node.inputs.every((input) => readings[input.name]) &&
          Object.keys(preview.fields).length === 0
        ) {
          onAnswer({ type: 'answer.measurement', nodeId: node.id, position, readings });
        }
      }}
    >
      <p className="text-lg">{node.prompt}</p>
      {node.inputs.map((input) => {
        const unit = units[input.name] ?? input.unit;
        const options = entryUnitOptions(input.quantity);
        const value = readNumber(typed[input.name] ?? '');
        const error =
          value !== null && Number.isNaN(value)
            ? 'Enter a number, such as 92.5.'
            : value === null
              ? tried
                ? `Enter “${input.label}”.`
                : undefined
              : preview.fields[input.name];
        return (
          <TextField
            key={input.name}
            label={input.label}
            labelAside={allowedRange(input, unit)}
            hint={input.hint}
            inputMode="decimal"
            autoComplete="off"
            value={typed[input.name] ?? ''}
            error={error}
            onChange={(event) =>
              setTyped((before) => ({ ...before, [input.name]: event.target.value }))
            }
            after={
              options.length > 1 ? (
                <select
                  aria-label={`Unit for ${input.label}`}
                  value={unit}
                  onChange={(event) =>
                    setUnits((before) => ({
                      ...before,
                      [input.name]: event.target.value as UnitCode,
                    }))
                  }
                  className="min-h-touch shrink-0 rounded-control border-2 border-line-strong bg-sunken px-3 font-semibold"
                >
                  {options.map((option) => (
                    <option key={option.value} value={option.value}>
                      {option.label}
                    </option>
                  ))}
                </select>
              ) : options[0] && options[0].value !== 'none' ? (
                <span className="flex min-w-14 shrink-0 items-center justify-center rounded-control bg-sunken px-3 font-semibold">
                  {options[0].label}
                </span>
              ) : null
            }
          />
        );
      })}
      {live.length > 0 || next ? (
        <section
          aria-label="Worked out as you type"
          className="flex flex-col gap-2 rounded-control bg-sunken px-4 py-3"
        >
          {live.length > 0 ? (
            <dl className="flex flex-col gap-1" aria-live="polite">
              {live.map((value) => (
                <div
                  key={value.name}
                  className="flex flex-wrap items-baseline justify-between gap-x-3"
                >
                  <dt>{value.label}</dt>
                  <dd className="text-xl font-bold">{value.display}</dd>
                </div>
              ))}
            </dl>
          ) : null}
          {next ? (
            <p aria-live="polite">
              <span className="font-semibold">Next: </span>
              {next.kind === 'outcome' ? `finding “${next.title}”` : next.title}
            </p>
          ) : null}
        </section>
      ) : null}
      <div>
        <Button type="submit" size="large">
          {node.inputs.length === 1
            ? 'Save reading'
            : node.inputs.length === 0
              ? 'Continue'
              : 'Save readings'}
        </Button>
      </div>
    </form>
  );
}
