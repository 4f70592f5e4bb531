// Every problem validation finds in the draft, each a button that selects its step (and the box
// it is about). Shown beside the graph and kept current as the lead types.
import type { TreeProblem } from '@heatpath/fault-tree';
import { memo, useId, useState } from 'react';
import type { EditableTree } from '../draft-model';
import { nodeTitle } from '../draft-model';
import { problemCount } from '../tree-format';

interface ProblemListProps {
  tree: EditableTree;
  problems: readonly TreeProblem[];
  onShow: (problem: TreeProblem) => void;
  /** Limits the height on wide screens, where the list sits under the graph. */
  className?: string;
}

// A broken link can leave a hundred steps unreachable at once; the first ones are enough to act
// on, and the rest are one tap away (drawing hundreds of rows would slow every keystroke).
const FIRST_SHOWN = 40;

export const ProblemList = memo(function ProblemList({
  tree,
  problems,
  onShow,
  className = '',
}: ProblemListProps) {
  const headingId = useId();
  const [showAll, setShowAll] = useState(false);
  const shown = showAll ? problems : problems.slice(0, FIRST_SHOWN);
  return (
    <section
      aria-labelledby={headingId}
      className={`flex flex-col gap-2 rounded-panel border-2 bg-surface p-3 ${
        problems.length > 0 ? 'border-danger-line' : 'border-ok-line'
      } ${className}`}
    >
      <h2 id={headingId} className="flex items-center gap-2 text-lg font-bold">
        <span aria-hidden="true">{problems.length > 0 ? '✕' : '✓'}</span>
        {problems.length > 0 ? `Problems (${problems.length})` : 'No problems'}
      </h2>
      {problems.length === 0 ? (
        <p className="text-ok-ink">The draft is complete: it can be tried and published.</p>
      ) : (
        <>
          <p className="text-sm text-ink-muted">
            {problemCount(problems.length)} to fix before publishing. The draft is still saved as it
            is.
          </p>
          <ul aria-label="Problems" className="flex flex-col gap-1 overflow-y-auto">
            {shown.map((problem, index) => (
              <li key={`${problem.code}:${problem.nodeId ?? ''}:${index}`}>
                <button
                  type="button"
                  onClick={() => onShow(problem)}
                  className="flex min-h-touch w-full flex-col items-start rounded-control px-2 py-1.5 text-left hover:bg-sunken"
                >
                  <span className="font-semibold underline underline-offset-4">
                    {problem.nodeId && tree.nodes[problem.nodeId]
                      ? nodeTitle(tree, problem.nodeId)
                      : problem.nodeId
                        ? `Step “${problem.nodeId}”`
                        : 'Tree details'}
                  </span>
                  <span>{problem.message}</span>
                </button>
              </li>
            ))}
          </ul>
          {problems.length > shown.length ? (
            <button
              type="button"
              onClick={() => setShowAll(true)}
              className="min-h-touch self-start rounded-control px-2 font-semibold underline underline-offset-4 hover:bg-sunken"
            >
              Show all {problems.length} problems
            </button>
          ) : null}
        </>
      )}
    </section>
  );
});
