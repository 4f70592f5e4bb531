// The difference between two versions of a tree, in words: steps added, removed and changed, and
// for each changed step its changed fields side by side (the API's diff, from fault-tree).
import type { TreeVersionInfo } from '@heatpath/contracts';
import type { FieldChange } from '@heatpath/fault-tree';
import { useMemo } from 'react';
import { useNavigate } from 'react-router';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/field';
import { Panel } from '../../../components/ui/page';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { useTreeDiff } from '../api/get-tree-diff';
import { useTreeVersion } from '../api/get-tree-version';
import { statusWords, versionName } from '../tree-format';

interface TreeDiffViewProps {
  treeId: string;
  versions: readonly TreeVersionInfo[];
  from: string;
  to: string;
}

const kindWords: Record<string, string> = {
  question: 'Question',
  measurement: 'Measurement',
  procedure: 'Procedure',
  outcome: 'Finding',
};

type Titles = ReadonlyMap<string, string>;

/** The diff names the step a way on leads to by its id; show its title, as the lead knows it. */
function Value({ text, titles }: { text: string | null; titles: Titles }) {
  if (text === null) return <span className="text-ink-muted">(none)</span>;
  const title = titles.get(text);
  return title ? (
    <>
      {title} <span className="text-sm text-ink-muted">({text})</span>
    </>
  ) : (
    <>{text}</>
  );
}

function titlesOf(definition: unknown): Titles {
  const nodes = (definition as { nodes?: Record<string, { title?: unknown }> } | undefined)?.nodes;
  const titles = new Map<string, string>();
  for (const [id, node] of Object.entries(nodes ?? {})) {
    if (typeof node.title === 'string') titles.set(id, node.title);
  }
  return titles;
}

function ChangesTable({
  caption,
  changes,
  fromName,
  toName,
  fromTitles,
  toTitles,
}: {
  caption: string;
  changes: readonly FieldChange[];
  fromName: string;
  toName: string;
  fromTitles: Titles;
  toTitles: Titles;
}) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full min-w-[36rem] table-fixed border-collapse text-left">
        <caption className="sr-only">{caption}</caption>
        <thead>
          <tr className="border-b-2 border-line-strong">
            <th scope="col" className="w-1/4 py-2 pr-3 text-sm font-semibold">
              What
            </th>
            <th scope="col" className="py-2 pr-3 text-sm font-semibold">
              In {fromName}
            </th>
            <th scope="col" className="py-2 text-sm font-semibold">
              In {toName}
            </th>
          </tr>
        </thead>
        <tbody>
          {changes.map((change, index) => (
            <tr key={`${change.field}:${index}`} className="border-b border-line align-top">
              <th scope="row" className="py-2 pr-3 font-semibold">
                {change.field}
              </th>
              <td className="py-2 pr-3 break-words whitespace-pre-line">
                <Value text={change.before} titles={fromTitles} />
              </td>
              <td className="py-2 break-words whitespace-pre-line">
                <Value text={change.after} titles={toTitles} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

export function TreeDiffView({ treeId, versions, from, to }: TreeDiffViewProps) {
  const navigate = useNavigate();
  const diff = useTreeDiff(treeId, from, to);
  const fromVersion = useTreeVersion(treeId, from);
  const toVersion = useTreeVersion(treeId, to);
  const fromTitles = useMemo(() => titlesOf(fromVersion.data?.definition), [fromVersion.data]);
  const toTitles = useMemo(() => titlesOf(toVersion.data?.definition), [toVersion.data]);
  const options = versions.map((version) => ({
    value: version.id,
    label: `${versionName(version)} (${statusWords[version.status].toLowerCase()})`,
  }));
  const nameOf = (id: string) => {
    const version = versions.find((candidate) => candidate.id === id);
    return version ? versionName(version) : 'this version';
  };
  const choose = (next: { from?: string; to?: string }) =>
    void navigate(
      `/trees/${treeId}/compare?${new URLSearchParams({ from: next.from ?? from, to: next.to ?? to })}`,
      { replace: true },
    );
  const fromName = nameOf(from);
  const toName = nameOf(to);

  return (
    <div className="flex flex-col gap-6">
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField
          label="From version"
          options={options}
          value={from}
          onChange={(event) => choose({ from: event.target.value })}
        />
        <SelectField
          label="To version"
          options={options}
          value={to}
          onChange={(event) => choose({ to: event.target.value })}
        />
      </div>
      <div>
        <Button variant="secondary" onClick={() => choose({ from: to, to: from })}>
          Swap the two
        </Button>
      </div>

      {!from || !to ? (
        <p>Choose two versions to compare.</p>
      ) : diff.isPending ? (
        <LoadingState label="Comparing versions…" />
      ) : diff.isError ? (
        <ErrorState
          title="Versions not compared"
          message={diff.error.message}
          onRetry={() => void diff.refetch()}
          retrying={diff.isRefetching}
        />
      ) : (
        <section
          aria-label={`Changes from ${fromName} to ${toName}`}
          className="flex flex-col gap-6"
        >
          <p className="text-lg" aria-live="polite">
            From {fromName} to {toName}: {diff.data.diff.added.length} added,{' '}
            {diff.data.diff.removed.length} removed, {diff.data.diff.changed.length} changed,{' '}
            {diff.data.diff.unchangedCount} unchanged.
          </p>
          {diff.data.diff.tree.length > 0 ? (
            <Panel labelledBy="diff-tree-heading">
              <h2 id="diff-tree-heading" className="mb-3 text-xl font-bold">
                The tree itself
              </h2>
              <ChangesTable
                caption="Changes to the tree’s own fields"
                changes={diff.data.diff.tree}
                fromName={fromName}
                toName={toName}
                fromTitles={fromTitles}
                toTitles={toTitles}
              />
            </Panel>
          ) : null}
          {diff.data.diff.added.length > 0 || diff.data.diff.removed.length > 0 ? (
            <div className="grid gap-4 md:grid-cols-2">
              <Panel labelledBy="diff-added-heading">
                <h2 id="diff-added-heading" className="mb-3 text-xl font-bold">
                  Added in {toName}
                </h2>
                {diff.data.diff.added.length === 0 ? (
                  <p className="text-ink-muted">No steps added.</p>
                ) : (
                  <ul className="flex flex-col gap-2">
                    {diff.data.diff.added.map((node) => (
                      <li key={node.nodeId} className="flex flex-wrap items-center gap-2">
                        <Badge tone="ok">
                          <span aria-hidden="true">+&nbsp;</span>Added
                        </Badge>
                        <span className="font-semibold">{node.title}</span>
                        <span className="text-ink-muted">{kindWords[node.kind] ?? node.kind}</span>
                      </li>
                    ))}
                  </ul>
                )}
              </Panel>
              <Panel labelledBy="diff-removed-heading">
                <h2 id="diff-removed-heading" className="mb-3 text-xl font-bold">
                  Removed from {fromName}
                </h2>
                {diff.data.diff.removed.length === 0 ? (
                  <p className="text-ink-muted">No steps removed.</p>
                ) : (
                  <ul className="flex flex-col gap-2">
                    {diff.data.diff.removed.map((node) => (
                      <li key={node.nodeId} className="flex flex-wrap items-center gap-2">
                        <Badge tone="danger">
                          <span aria-hidden="true">−&nbsp;</span>Removed
                        </Badge>
                        <span className="font-semibold">{node.title}</span>
                        <span className="text-ink-muted">{kindWords[node.kind] ?? node.kind}</span>
                      </li>
                    ))}
                  </ul>
                )}
              </Panel>
            </div>
          ) : null}
          {diff.data.diff.changed.map((node) => (
            <Panel key={node.nodeId} labelledBy={`diff-${node.nodeId}`}>
              <h2
                id={`diff-${node.nodeId}`}
                className="mb-3 flex flex-wrap items-center gap-2 text-xl font-bold"
              >
                <Badge tone="caution">
                  <span aria-hidden="true">~&nbsp;</span>Changed
                </Badge>
                {node.title}
                <span className="text-base font-normal text-ink-muted">
                  {kindWords[node.kind] ?? node.kind}
                </span>
              </h2>
              <ChangesTable
                caption={`Changes to ${node.title}`}
                changes={node.changes}
                fromName={fromName}
                toName={toName}
                fromTitles={fromTitles}
                toTitles={toTitles}
              />
            </Panel>
          ))}
          {diff.data.diff.tree.length === 0 &&
          diff.data.diff.added.length === 0 &&
          diff.data.diff.removed.length === 0 &&
          diff.data.diff.changed.length === 0 ? (
            <p>The two versions are the same.</p>
          ) : null}
        </section>
      )}
    </div>
  );
}
