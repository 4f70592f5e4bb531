// The draft editor: the live graph and the problems on one side, the form of the selected step
// (or the tree's details, or the "Try it" walk) on the other. The working copy lives here; it is
// validated as it changes and saved automatically. The graph, the problems and the field errors
// follow a deferred copy, so a keystroke paints first and the tree-wide work comes right after.
import type { TreeVersionDetail } from '@heatpath/contracts';
import {
  formulaNamesOf,
  quantities,
  validateTree,
  type NodeKind,
  type Quantity,
  type TreeNode,
  type TreeProblem,
} from '@heatpath/fault-tree';
import { useQueryClient } from '@tanstack/react-query';
import {
  useCallback,
  useDeferredValue,
  useEffect,
  useLayoutEffect,
  useMemo,
  useRef,
  useState,
} from 'react';
import { Alert } from '../../../components/ui/alert';
import { Badge } from '../../../components/ui/badge';
import { Button, ButtonLink } from '../../../components/ui/button';
import { isApiError } from '../../../lib/api-client';
import { stepKindLabels as kindLabels } from '../../../lib/step-labels';
import { draftQueryOptions } from '../api/get-draft';
import {
  addNode,
  connectNodes,
  deleteNode,
  edgesOf,
  nodeKinds,
  nodeTitle,
  normaliseDefinition,
  pathKey,
  replaceNode,
  setIn,
  type EditableTree,
} from '../draft-model';
import { useDraftAutosave, type SaveState } from '../hooks/use-draft-autosave';
import type { FormContext, SetAt, StepOption } from './editor-fields';
import { NodeForm } from './node-form';
import { ProblemList } from './problem-list';
import { SaveConflict } from './save-conflict';
import { TreeDetailsForm } from './tree-details-form';
import { TreeGraph, type GraphFocus } from './tree-graph';
import { TryItPreview } from './try-it-preview';

type Selection = { kind: 'tree' } | { kind: 'node'; id: string };

interface DraftEditorProps {
  treeId: string;
  draft: TreeVersionDetail;
  /** Called (after saving what is waiting) when the lead asks to check and publish. */
  onPublish: () => void;
}

function namesOf(tree: EditableTree): Record<string, Quantity> {
  try {
    const names = formulaNamesOf(tree);
    return Object.fromEntries(
      Object.entries(names).filter(([, quantity]) =>
        (quantities as readonly string[]).includes(quantity),
      ),
    );
  } catch {
    return {};
  }
}

/**
 * Under its own box a schema problem need not repeat where it is: '"nodes › cap-test › prompt"
 * must not be empty.' reads "This must not be empty." there (the list keeps the full sentence).
 */
function fieldMessage(message: string | undefined): string | undefined {
  return message?.replace(/^"[^"]*›[^"]*" /, 'This ');
}

function SaveStatus({ state, onRetry }: { state: SaveState; onRetry: () => void }) {
  return (
    <div role="status" className="flex min-h-touch items-center gap-2">
      {state.kind === 'saved' ? (
        <span className="font-semibold text-ok-ink">
          <span aria-hidden="true">✓ </span>Saved
        </span>
      ) : state.kind === 'waiting' || state.kind === 'saving' ? (
        <span className="font-semibold text-ink-muted">Saving…</span>
      ) : state.kind === 'failed' ? (
        <>
          <span className="font-semibold text-danger-ink">
            <span aria-hidden="true">✕ </span>Not saved
          </span>
          <Button variant="secondary" onClick={onRetry} title={state.message}>
            Retry
          </Button>
        </>
      ) : (
        <span className="font-semibold text-danger-ink">
          <span aria-hidden="true">✕ </span>Not saved — conflict
        </span>
      )}
    </div>
  );
}

export function DraftEditor({ treeId, draft, onPublish }: DraftEditorProps) {
  const queryClient = useQueryClient();
  const [tree, setTree] = useState(() => normaliseDefinition(draft.definition));
  const [selection, setSelection] = useState<Selection>(() =>
    tree.nodes[tree.start] ? { kind: 'node', id: tree.start } : { kind: 'tree' },
  );
  const [mode, setMode] = useState<'edit' | 'try'>('edit');
  const [walkAt, setWalkAt] = useState<string | null>(null);
  const [samples, setSamples] = useState<Record<string, string>>({});
  const [newKind, setNewKind] = useState<NodeKind>('question');
  const [notice, setNotice] = useState<string | null>(null);
  // The step the "connect it" notice is about: once a way on leads there, the notice has done its job.
  const [noticeUntilLinked, setNoticeUntilLinked] = useState<string | null>(null);
  const [graphFocus, setGraphFocus] = useState<GraphFocus | null>(null);
  const [fieldFocus, setFieldFocus] = useState<{ path: string; seq: number } | null>(null);
  const [theirs, setTheirs] = useState<TreeVersionDetail | null>(null);
  const [conflictBusy, setConflictBusy] = useState(false);
  const [conflictError, setConflictError] = useState<string | null>(null);
  const formRef = useRef<HTMLDivElement>(null);
  const treeRef = useRef(tree);
  useLayoutEffect(() => {
    treeRef.current = tree;
  }, [tree]);

  const autosave = useDraftAutosave({ treeId, tree, revision: draft.revision });

  const deferred = useDeferredValue(tree);
  const problems = useMemo(() => validateTree(deferred), [deferred]);
  const problemsByNode = useMemo(() => {
    const counts = new Map<string, number>();
    for (const problem of problems) {
      if (problem.nodeId) counts.set(problem.nodeId, (counts.get(problem.nodeId) ?? 0) + 1);
    }
    return counts;
  }, [problems]);
  const messagesByPath = useMemo(() => {
    const messages = new Map<string, string>();
    for (const problem of problems) {
      if (!problem.path) continue;
      const key = pathKey(problem.path);
      if (!messages.has(key)) messages.set(key, problem.message);
    }
    return messages;
  }, [problems]);
  const names = useMemo(() => namesOf(deferred), [deferred]);
  // Rebuilt only when a step is added, removed or renamed, so the 'Leads to' boxes can skip work.
  const titlesKey = Object.keys(tree.nodes)
    .map((id) => `${id}\u0001${nodeTitle(tree, id)}`)
    .join('\u0002');
  const options = useMemo<StepOption[]>(
    () =>
      titlesKey
        .split('\u0002')
        .filter(Boolean)
        .map((entry) => {
          const [id = '', title = ''] = entry.split('\u0001');
          return { id, title };
        }),
    [titlesKey],
  );
  const onSampleChange = useCallback(
    (name: string, text: string) => setSamples((before) => ({ ...before, [name]: text })),
    [],
  );
  const setAt = useCallback<SetAt>(
    (path, value) => setTree((before) => setIn(before, path, value)),
    [],
  );
  const context = useMemo<FormContext>(
    () => ({
      options,
      setAt,
      errorAt: (path) => fieldMessage(messagesByPath.get(pathKey(path))),
      names,
      samples,
      onSampleChange,
    }),
    [options, setAt, messagesByPath, names, samples, onSampleChange],
  );

  const update = (next: EditableTree) => setTree(next);

  const showForm = () => {
    // On a tablet the form sits under the graph: bring it into view when a step is picked.
    if (window.innerWidth < 1024) formRef.current?.scrollIntoView?.({ block: 'start' });
  };

  const select = useCallback((id: string) => {
    setSelection({ kind: 'node', id });
    setMode('edit');
    // The form itself takes the focus, not a box in it: on a tablet a focused box would pop up
    // the keyboard over the graph the lead just tapped.
    setFieldFocus((before) => ({ path: '', seq: (before?.seq ?? 0) + 1 }));
  }, []);

  const connect = useCallback((from: string, to: string) => {
    const result = connectNodes(treeRef.current, from, to);
    setNotice(result.message);
    setNoticeUntilLinked(null);
    if (result.changed) {
      setTree(result.tree);
      setSelection({ kind: 'node', id: from });
      setMode('edit');
    }
  }, []);

  // The graph follows the "Try it" walk, so the lead sees where in the tree each answer leads.
  const followWalk = useCallback((id: string | null) => {
    setWalkAt(id);
    if (id) setGraphFocus((before) => ({ id, seq: (before?.seq ?? 0) + 1 }));
  }, []);

  const showProblem = useCallback((problem: TreeProblem) => {
    const id = problem.nodeId && treeRef.current.nodes[problem.nodeId] ? problem.nodeId : null;
    setMode('edit');
    if (id) {
      setSelection({ kind: 'node', id });
      setGraphFocus((before) => ({ id, seq: (before?.seq ?? 0) + 1 }));
    } else {
      setSelection({ kind: 'tree' });
    }
    setFieldFocus((before) => ({
      path: problem.path ? pathKey(problem.path) : id ? `nodes.${id}` : 'title',
      seq: (before?.seq ?? 0) + 1,
    }));
  }, []);

  // After a selection from the problem list or the graph, put the keyboard where the problem is:
  // the box the path names, or the closest enclosing one, or the form itself.
  useEffect(() => {
    if (!fieldFocus) return;
    const form = formRef.current;
    if (!form) return;
    if (fieldFocus.path === '') {
      form.querySelector<HTMLElement>('[tabindex="-1"]')?.focus({ preventScroll: true });
      showForm();
      return;
    }
    const parts = fieldFocus.path.split('.');
    let target: HTMLElement | null = null;
    while (parts.length > 0 && !target) {
      const key = parts.join('.');
      target = form.querySelector<HTMLElement>(`[data-path="${key.replace(/["\\]/g, '\\$&')}"]`);
      parts.pop();
    }
    const focusable =
      target && target.matches('input, select, textarea, button')
        ? target
        : (target?.querySelector<HTMLElement>('input, select, textarea') ??
          form.querySelector<HTMLElement>('input, select, textarea'));
    if (focusable) {
      focusable.focus({ preventScroll: true });
      if (window.innerWidth >= 1024 || fieldFocus.path.split('.').length > 2) {
        focusable.scrollIntoView?.({ block: 'center' });
      } else {
        showForm();
      }
    }
  }, [fieldFocus]);

  const addStep = () => {
    const { tree: next, id } = addNode(tree, newKind);
    update(next);
    setSelection({ kind: 'node', id });
    setMode('edit');
    setNotice(
      `Added “${nodeTitle(next, id)}”. Connect it: drag from a step’s lower handle to it, or pick it as a “Leads to” step.`,
    );
    setNoticeUntilLinked(id);
    setGraphFocus((before) => ({ id, seq: (before?.seq ?? 0) + 1 }));
    setFieldFocus((before) => ({ path: `nodes.${id}.title`, seq: (before?.seq ?? 0) + 1 }));
  };

  const reloadTheirs = async () => {
    setConflictBusy(true);
    setConflictError(null);
    try {
      const fresh =
        theirs ?? (await queryClient.fetchQuery({ ...draftQueryOptions(treeId), staleTime: 0 }));
      const next = normaliseDefinition(fresh.definition);
      autosave.adopt(next, fresh.revision);
      queryClient.setQueryData(draftQueryOptions(treeId).queryKey, fresh);
      setTree(next);
      setTheirs(null);
      if (selection.kind === 'node' && !next.nodes[selection.id]) setSelection({ kind: 'tree' });
    } catch (error) {
      setConflictError(isApiError(error) ? error.message : 'Their draft could not be loaded.');
    } finally {
      setConflictBusy(false);
    }
  };

  const compare = async () => {
    setConflictBusy(true);
    setConflictError(null);
    try {
      setTheirs(await queryClient.fetchQuery({ ...draftQueryOptions(treeId), staleTime: 0 }));
    } catch (error) {
      setConflictError(isApiError(error) ? error.message : 'Their draft could not be loaded.');
    } finally {
      setConflictBusy(false);
    }
  };

  const keepMine = async () => {
    if (!theirs) return;
    const saved = await autosave.overwrite(theirs.revision);
    if (saved) setTheirs(null);
  };

  const incoming = useMemo(() => {
    const counts = new Map<string, number>();
    for (const edge of edgesOf(deferred)) counts.set(edge.to, (counts.get(edge.to) ?? 0) + 1);
    return counts;
  }, [deferred]);

  const selectedNode: TreeNode | undefined =
    selection.kind === 'node' ? tree.nodes[selection.id] : undefined;

  return (
    <div className="flex flex-col gap-4">
      <header className="flex flex-col gap-3">
        <div className="flex flex-wrap items-center gap-3">
          <h1 className="text-2xl font-bold">{tree.title || 'Untitled tree'}</h1>
          <Badge tone="caution">Draft v{draft.version}</Badge>
          {draft.basedOnVersion ? (
            <span className="text-ink-muted">based on v{draft.basedOnVersion}</span>
          ) : null}
        </div>
        <div className="flex flex-wrap items-center gap-3">
          <SaveStatus state={autosave.state} onRetry={() => void autosave.saveNow()} />
          <div className="ml-auto flex flex-wrap gap-3">
            <ButtonLink to={`/trees/${treeId}`} variant="quiet">
              Versions
            </ButtonLink>
            <Button
              variant="secondary"
              aria-pressed={mode === 'try'}
              onClick={() => setMode(mode === 'try' ? 'edit' : 'try')}
            >
              {mode === 'try' ? (
                <>
                  <span aria-hidden="true">✓ </span>Try it
                </>
              ) : (
                'Try it'
              )}
            </Button>
            <Button
              onClick={() => {
                void autosave.saveNow().then((saved) => {
                  if (saved) onPublish();
                });
              }}
              disabled={autosave.state.kind === 'conflict'}
            >
              Check and publish
            </Button>
          </div>
        </div>
      </header>

      {autosave.state.kind === 'conflict' ? (
        <SaveConflict
          message={autosave.state.message}
          mine={tree}
          theirs={theirs}
          loading={conflictBusy}
          error={conflictError}
          onReloadTheirs={() => void reloadTheirs()}
          onCompare={() => void compare()}
          onKeepMine={() => void keepMine()}
        />
      ) : autosave.state.kind === 'failed' ? (
        <Alert tone="danger" title="Not saved" role="alert">
          <p>{autosave.state.message}</p>
          <p>Your changes are kept on this screen. Heatpath tries again with your next change.</p>
          <div>
            <Button variant="secondary" onClick={() => void autosave.saveNow()}>
              Retry saving
            </Button>
          </div>
        </Alert>
      ) : null}

      <div
        className={`grid gap-4 ${mode === 'try' ? 'lg:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]' : 'lg:grid-cols-2'}`}
      >
        <div className="flex min-w-0 flex-col gap-3 lg:sticky lg:top-4 lg:max-h-[calc(100dvh-2rem)] lg:self-start">
          <div className="flex flex-wrap items-end gap-2">
            <Button
              variant="secondary"
              aria-pressed={selection.kind === 'tree' && mode === 'edit'}
              onClick={() => {
                setSelection({ kind: 'tree' });
                setMode('edit');
                setFieldFocus((before) => ({ path: '', seq: (before?.seq ?? 0) + 1 }));
              }}
            >
              Tree details
            </Button>
            <div className="ml-auto flex items-end gap-2">
              <label className="flex flex-col gap-1">
                <span className="text-sm font-semibold">Kind of step</span>
                <select
                  value={newKind}
                  onChange={(event) => setNewKind(event.target.value as NodeKind)}
                  className="min-h-touch rounded-control border-2 border-line-strong bg-surface px-3"
                >
                  {nodeKinds.map((kind) => (
                    <option key={kind} value={kind}>
                      {kindLabels[kind]}
                    </option>
                  ))}
                </select>
              </label>
              <Button onClick={addStep}>
                <span aria-hidden="true">+</span> Add step
              </Button>
            </div>
          </div>
          {/* On a wide screen the column fits the window: the graph gives way to the problem list
              (up to a third of the height), so the problems to fix stay readable beside it. */}
          <section
            aria-label="Tree graph"
            aria-describedby="tree-graph-help"
            className="h-[26rem] overflow-hidden rounded-panel border-2 border-line bg-canvas lg:h-auto lg:min-h-[16rem] lg:flex-[1_1_46dvh]"
          >
            <TreeGraph
              tree={deferred}
              problemsByNode={problemsByNode}
              selectedId={selection.kind === 'node' && mode === 'edit' ? selection.id : null}
              currentId={mode === 'try' ? walkAt : null}
              focus={graphFocus}
              onSelect={select}
              onConnect={connect}
            />
          </section>
          <div id="tree-graph-help" className="text-sm text-ink-muted">
            <p>
              Tap a step to edit it. Drag from the round handle under a step to another step to add
              a way on.
            </p>
            <details className="mt-1">
              <summary className="min-h-touch cursor-pointer py-3 font-semibold text-ink">
                What a new connection does
              </summary>
              <ul className="list-disc pl-6">
                <li>From a question: a new answer leading there (rename it in the form).</li>
                <li>From a procedure: “Done” if it is not set, otherwise “Could not do”.</li>
                <li>From a measurement: a new branch; write its condition in the form.</li>
                <li>
                  On a touch screen: tap the handle under a step, then the other step’s top handle.
                </li>
              </ul>
            </details>
          </div>
          {notice && !(noticeUntilLinked && incoming.get(noticeUntilLinked)) ? (
            <p role="status" className="rounded-control bg-info-bg px-3 py-2 text-info-ink">
              {notice}
            </p>
          ) : null}
          <ProblemList
            tree={deferred}
            problems={problems}
            onShow={showProblem}
            className="lg:max-h-[30dvh] lg:shrink-0 lg:overflow-y-auto"
          />
        </div>

        <div
          ref={formRef}
          className="min-w-0 scroll-mt-4 rounded-panel border-2 border-line bg-surface p-4 sm:p-5"
        >
          {mode === 'try' ? (
            <TryItPreview
              tree={deferred}
              onCurrentChange={followWalk}
              onShowProblems={() => setMode('edit')}
            />
          ) : selection.kind === 'node' && selectedNode ? (
            <NodeForm
              key={selection.id}
              id={selection.id}
              node={selectedNode}
              isStart={tree.start === selection.id}
              incoming={incoming.get(selection.id) ?? 0}
              problemCount={problemsByNode.get(selection.id) ?? 0}
              context={context}
              onChange={(node) => update(replaceNode(tree, selection.id, node))}
              onMakeStart={() => update({ ...tree, start: selection.id })}
              onDelete={() => {
                const title = nodeTitle(tree, selection.id);
                update(deleteNode(tree, selection.id));
                setSelection({ kind: 'tree' });
                setNotice(`Deleted “${title}”. Any way on that led there is listed as a problem.`);
                setNoticeUntilLinked(null);
              }}
            />
          ) : (
            <TreeDetailsForm
              tree={tree}
              context={context}
              onChange={(patch) => update({ ...tree, ...patch })}
            />
          )}
        </div>
      </div>
    </div>
  );
}
