// The live graph of the tree beside the form (@xyflow/react, laid out by dagre). Each step is a
// button named by its title; a step with problems has a thick red edge and says how many in
// words, the selected one a thick outline and the word "Editing". Drawing a line from a step's
// lower handle to another step adds a way on (see connectNodes). Layout depends only on the
// structure, and node objects are reused when nothing about them changed, so typing in the form
// re-renders next to nothing here.
import {
  Controls,
  Handle,
  MarkerType,
  Position,
  ReactFlow,
  ReactFlowProvider,
  useReactFlow,
  type Connection,
  type Edge,
  type Node,
  type NodeProps,
  type ReactFlowInstance,
} from '@xyflow/react';
import '@xyflow/react/dist/base.css';
import { memo, useCallback, useEffect, useMemo, useState } from 'react';
import { stepKindLabels as kindLabels } from '../../../lib/step-labels';
import { edgesOf, type EditableTree, type GraphEdge } from '../draft-model';
import { requestLayout } from '../graph-layout-client';
import {
  cachedLayout,
  interimLayout,
  layoutFor,
  NODE_HEIGHT,
  NODE_WIDTH,
  structureKey,
  SYNC_LAYOUT_LIMIT,
  type Layout,
} from '../graph-layout';
import './tree-graph.css';

export interface GraphFocus {
  id: string;
  /** Bumped on every request, so asking twice for the same node centres it again. */
  seq: number;
}

interface StepData extends Record<string, unknown> {
  title: string;
  kindLabel: string;
  problems: number;
  isStart: boolean;
  selected: boolean;
  current: boolean;
  isOutcome: boolean;
  onSelect: (id: string) => void;
}

type StepFlowNode = Node<StepData, 'step'>;

const StepNodeView = memo(function StepNodeView({
  id,
  data,
  positionAbsoluteX,
  positionAbsoluteY,
}: NodeProps<StepFlowNode>) {
  const flow = useReactFlow();
  const descId = `graph-node-${id}-desc`;
  const classes = [
    'tree-node flex h-full w-full flex-col items-start justify-between gap-1 rounded-control px-3 py-2 text-left',
    data.current ? 'bg-info-bg' : 'bg-surface',
    data.problems > 0 ? 'border-[3px] border-danger-line' : 'border-2 border-line-strong',
    data.selected ? 'outline-4 outline-offset-2 outline-primary' : '',
  ].join(' ');
  return (
    <>
      <Handle
        type="target"
        position={Position.Top}
        className="tree-handle"
        title={`Connect a way on to “${data.title}”`}
      />
      <button
        type="button"
        className={classes}
        aria-label={data.title}
        aria-describedby={descId}
        aria-pressed={data.selected}
        onClick={() => data.onSelect(id)}
        // Moving through the steps with the keyboard brings each one into view as it is reached.
        onFocus={(event) => {
          if (!event.currentTarget.matches(':focus-visible')) return;
          void flow.setCenter(
            positionAbsoluteX + NODE_WIDTH / 2,
            positionAbsoluteY + NODE_HEIGHT / 2,
            {
              zoom: Math.max(flow.getZoom(), 0.7),
              duration: 200,
            },
          );
        }}
      >
        <span className="flex w-full items-center justify-between gap-2 text-sm text-ink-muted">
          <span>{data.kindLabel}</span>
          {data.isStart ? <span className="font-semibold text-ink">▶ Start</span> : null}
        </span>
        <span className="line-clamp-2 w-full text-base leading-tight font-semibold">
          {data.title}
        </span>
        <span className="flex min-h-[1.45rem] w-full items-center justify-between gap-2 text-sm font-semibold">
          {data.problems > 0 ? (
            <span className="text-danger-ink">
              <span aria-hidden="true">✕ </span>
              {data.problems === 1 ? '1 problem' : `${data.problems} problems`}
            </span>
          ) : (
            <span />
          )}
          {data.selected ? <span className="text-primary">Editing</span> : null}
          {data.current ? <span className="text-info-ink">Walk is here</span> : null}
        </span>
        <span id={descId} className="sr-only">
          {[
            data.kindLabel,
            data.isStart ? 'first step' : '',
            data.problems > 0
              ? `${data.problems} problem${data.problems === 1 ? '' : 's'}`
              : 'no problems',
          ]
            .filter(Boolean)
            .join(', ')}
        </span>
      </button>
      {data.isOutcome ? null : (
        <Handle
          type="source"
          position={Position.Bottom}
          className="tree-handle"
          title={`Drag from here to another step to add a way on from “${data.title}”`}
        />
      )}
    </>
  );
});

const nodeTypes = { step: StepNodeView };

interface TreeGraphProps {
  tree: EditableTree;
  problemsByNode: ReadonlyMap<string, number>;
  selectedId: string | null;
  /** The step the "Try it" walk is at, if it is running. */
  currentId?: string | null;
  focus: GraphFocus | null;
  onSelect: (id: string) => void;
  onConnect: (from: string, to: string) => void;
}

function shorten(text: string, length = 32): string {
  return text.length > length ? `${text.slice(0, length - 1)}…` : text;
}

function sameData(a: StepData, b: StepData): boolean {
  return (
    a.title === b.title &&
    a.kindLabel === b.kindLabel &&
    a.problems === b.problems &&
    a.isStart === b.isStart &&
    a.selected === b.selected &&
    a.current === b.current &&
    a.isOutcome === b.isOutcome &&
    a.onSelect === b.onSelect
  );
}

interface EdgeInput {
  edge: GraphEdge;
  label: string;
  ariaLabel: string;
}

/**
 * Hands back the previous node or edge object whenever nothing about it changed, so React Flow
 * (which compares by identity) re-renders only the nodes an edit touched.
 */
function createFlowCache() {
  let nodeCache = new Map<string, StepFlowNode>();
  let edgeCache = new Map<string, Edge>();
  return {
    nodes(inputs: { id: string; position: { x: number; y: number }; data: StepData }[]) {
      const next = new Map<string, StepFlowNode>();
      const list = inputs.map(({ id, position, data }) => {
        const before = nodeCache.get(id);
        const node: StepFlowNode =
          before &&
          before.position.x === position.x &&
          before.position.y === position.y &&
          sameData(before.data, data)
            ? before
            : {
                id,
                type: 'step',
                position,
                data,
                width: NODE_WIDTH,
                height: NODE_HEIGHT,
                draggable: false,
                selectable: false,
              };
        next.set(id, node);
        return node;
      });
      nodeCache = next;
      return list;
    },
    edges(inputs: EdgeInput[]) {
      const next = new Map<string, Edge>();
      const list = inputs.map(({ edge, label, ariaLabel }) => {
        const before = edgeCache.get(edge.id);
        const flowEdge: Edge =
          before &&
          before.source === edge.from &&
          before.target === edge.to &&
          before.label === label &&
          before.ariaLabel === ariaLabel
            ? before
            : {
                id: edge.id,
                source: edge.from,
                target: edge.to,
                label,
                ariaLabel,
                markerEnd: { type: MarkerType.ArrowClosed, width: 18, height: 18 },
                className:
                  edge.kind === 'could-not-do' || edge.kind === 'fallback'
                    ? 'tree-edge tree-edge-alt'
                    : 'tree-edge',
                labelBgPadding: [6, 3],
                labelBgBorderRadius: 6,
                focusable: false,
              };
        next.set(edge.id, flowEdge);
        return flowEdge;
      });
      edgeCache = next;
      return list;
    },
  };
}

interface LayoutState {
  key: string;
  layout: Layout;
  /** False while the proper layout of this structure is still being worked out. */
  settled: boolean;
}

/**
 * The positions for the current structure. A text edit keeps the layout it has; a structural
 * edit uses a cached layout, lays a small tree out at once, or — for a large tree — shows the
 * edit immediately with an interim placement and swaps in the worker's layout when it arrives.
 */
function useGraphLayout(
  ids: readonly string[],
  edges: readonly GraphEdge[],
  start: string,
): Layout {
  const key = `${start}\u0000${structureKey(ids, edges)}`;
  const [state, setState] = useState<LayoutState>(() => ({
    key,
    layout: layoutFor(key, ids, edges, start),
    settled: true,
  }));
  let current = state;
  if (state.key !== key) {
    const ready =
      cachedLayout(key) ??
      (ids.length <= SYNC_LAYOUT_LIMIT ? layoutFor(key, ids, edges, start) : null);
    current = ready
      ? { key, layout: ready, settled: true }
      : { key, layout: interimLayout(state.layout, ids, edges), settled: false };
    setState(current);
  }
  const waiting = !current.settled;
  useEffect(() => {
    if (!waiting) return;
    let cancelled = false;
    void requestLayout(key, ids, edges, start).then((layout) => {
      if (!cancelled) {
        setState((before) => (before.key === key ? { key, layout, settled: true } : before));
      }
    });
    return () => {
      cancelled = true;
    };
    // One job per structure: ids and edges only matter through the key.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [key, waiting]);
  return current.layout;
}

function CenterOn({ focus, layout }: { focus: GraphFocus | null; layout: Layout }) {
  const flow = useReactFlow();
  // The step may only appear (or move) once its layout is ready: centre again when it does.
  const position = focus ? layout.get(focus.id) : undefined;
  const x = position?.x;
  const y = position?.y;
  useEffect(() => {
    if (!focus || x === undefined || y === undefined) return;
    void flow.setCenter(x + NODE_WIDTH / 2, y + NODE_HEIGHT / 2, {
      zoom: Math.max(flow.getZoom(), 0.8),
      duration: 250,
    });
    // A new request or a new place for the step moves the view; zooming by hand does not.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [focus, x, y]);
  return null;
}

export const TreeGraph = memo(function TreeGraph({
  tree,
  problemsByNode,
  selectedId,
  currentId = null,
  focus,
  onSelect,
  onConnect,
}: TreeGraphProps) {
  const ids = useMemo(() => Object.keys(tree.nodes), [tree.nodes]);
  const edges = useMemo(() => edgesOf(tree), [tree]);
  const layout = useGraphLayout(ids, edges, tree.start);
  const [cache] = useState(createFlowCache);

  const flowNodes = useMemo(
    () =>
      cache.nodes(
        ids.map((id) => {
          const node = tree.nodes[id];
          const data: StepData = {
            title: typeof node?.title === 'string' && node.title.trim() ? node.title : id,
            kindLabel:
              node && node.kind in kindLabels ? kindLabels[node.kind] : 'Unknown kind of step',
            problems: problemsByNode.get(id) ?? 0,
            isStart: tree.start === id,
            selected: selectedId === id,
            current: currentId === id,
            isOutcome: node?.kind === 'outcome',
            onSelect,
          };
          return { id, position: layout.get(id) ?? { x: 0, y: 0 }, data };
        }),
      ),
    [cache, ids, tree.nodes, tree.start, layout, problemsByNode, selectedId, currentId, onSelect],
  );

  const flowEdges = useMemo(() => {
    const known = new Set(ids);
    const titleOf = (id: string) => tree.nodes[id]?.title || id;
    // Several ways on between the same two steps (four answers that all lead to one check) are
    // drawn as one line, so their labels do not pile up on each other.
    const groups = new Map<string, GraphEdge[]>();
    for (const edge of edges) {
      if (!known.has(edge.to)) continue;
      const key = `${edge.from}>${edge.to}`;
      const group = groups.get(key);
      if (group) group.push(edge);
      else groups.set(key, [edge]);
    }
    return cache.edges(
      [...groups.values()].map((group) => {
        const first = group[0] as GraphEdge;
        const words = group.map((edge) => edge.label);
        return {
          edge: first,
          label:
            group.length === 1
              ? shorten(first.label)
              : group.every((edge) => edge.kind === 'choice')
                ? `${group.length} answers`
                : group.every((edge) => edge.kind === 'branch' || edge.kind === 'fallback')
                  ? `${group.length} branches`
                  : shorten(words.join(' / ')),
          ariaLabel: `${words.join('; ')}: from “${titleOf(first.from)}” to “${titleOf(first.to)}”`,
        };
      }),
    );
  }, [cache, edges, ids, tree.nodes]);

  const connect = useCallback(
    (connection: Connection) => {
      if (connection.source && connection.target) onConnect(connection.source, connection.target);
    },
    [onConnect],
  );

  // A small tree fits the panel; a large one opens on its first step at a readable size.
  const [fits] = useState(() => ids.length <= 30);
  const openOnStart = (flow: ReactFlowInstance<StepFlowNode>) => {
    if (fits) return;
    const start = layout.get(tree.start);
    if (start) {
      void flow.setCenter(start.x + NODE_WIDTH / 2, start.y + NODE_HEIGHT * 1.5, { zoom: 0.85 });
    }
  };

  return (
    <ReactFlowProvider>
      <ReactFlow
        nodes={flowNodes}
        edges={flowEdges}
        nodeTypes={nodeTypes}
        onConnect={connect}
        isValidConnection={(connection) => connection.source !== connection.target}
        nodesDraggable={false}
        nodesFocusable={false}
        edgesFocusable={false}
        elementsSelectable={false}
        nodesConnectable
        connectOnClick
        onlyRenderVisibleElements={ids.length > 60}
        minZoom={0.1}
        maxZoom={1.6}
        fitViewOptions={{ maxZoom: 1, padding: 0.15 }}
        colorMode="system"
        proOptions={{ hideAttribution: false }}
        fitView={fits}
        onInit={openOnStart}
      >
        <Controls showInteractive={false} position="top-right" orientation="horizontal" />
        <CenterOn focus={focus} layout={layout} />
      </ReactFlow>
    </ReactFlowProvider>
  );
});
