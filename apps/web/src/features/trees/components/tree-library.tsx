// The tree library: every tree of the workshop with its symptom, its versions (status, who
// published it and when, the change note, how many cases used it) and its open draft, and the
// three ways to add a tree — from scratch, as a copy, or by importing a definition file — and
// deleting one that was never published.
import type { TreeLibraryEntry } from '@heatpath/contracts';
import { useState } from 'react';
import { Link, useNavigate } from 'react-router';
import { Alert } from '../../../components/ui/alert';
import { Badge } from '../../../components/ui/badge';
import { Button, ButtonLink } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { Panel } from '../../../components/ui/page';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { useCreateTree } from '../api/create-tree';
import { useDeleteTree } from '../api/delete-tree';
import { useTreeLibrary } from '../api/get-tree-library';
import { useStartDraft } from '../api/start-draft';
import { formatWhen, statusTones, statusWords } from '../tree-format';
import { ImportTreeFile } from './import-tree-file';
import { NewTreeForm } from './new-tree-form';

export function TreeLibrary() {
  const library = useTreeLibrary();
  const [creating, setCreating] = useState(false);

  return (
    <div className="flex flex-col gap-6">
      <div className="flex flex-wrap items-start gap-3">
        <Button
          size="large"
          aria-expanded={creating}
          aria-controls="new-tree-panel"
          onClick={() => setCreating(!creating)}
        >
          New tree
        </Button>
        <ImportTreeFile />
      </div>
      {creating ? (
        <div id="new-tree-panel">
          <Panel>
            <NewTreeForm onCancel={() => setCreating(false)} />
          </Panel>
        </div>
      ) : null}

      {library.isPending ? (
        <LoadingState label="Loading trees…" />
      ) : library.isError ? (
        <ErrorState
          title="Trees not loaded"
          message={library.error.message}
          onRetry={() => void library.refetch()}
          retrying={library.isRefetching}
        />
      ) : library.data.trees.length === 0 ? (
        <p>No trees yet. Start one with “New tree”, or import a tree file.</p>
      ) : (
        <ul aria-label="Trees" className="flex flex-col gap-4">
          {library.data.trees.map((entry) => (
            <li key={entry.id}>
              <TreeCard entry={entry} />
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}

function TreeCard({ entry }: { entry: TreeLibraryEntry }) {
  const navigate = useNavigate();
  const startDraft = useStartDraft();
  const createTree = useCreateTree();
  const [copying, setCopying] = useState(false);
  const [copyTitle, setCopyTitle] = useState(`Copy of ${entry.title}`);
  const deleteTree = useDeleteTree();
  const [confirmDelete, setConfirmDelete] = useState(false);
  // Only a tree no case can have used: every version it has is a draft.
  const neverPublished = entry.versions.every((v) => v.status === 'draft');
  const headingId = `tree-${entry.id}`;
  const versions = [...entry.versions].sort((a, b) => b.version - a.version);

  return (
    <article
      aria-labelledby={headingId}
      className="flex flex-col gap-4 rounded-panel border-2 border-line bg-surface p-4 sm:p-6"
    >
      <div className="flex flex-col gap-1">
        <h2 id={headingId} className="text-xl font-bold">
          <Link to={`/trees/${entry.id}`} className="underline-offset-4 hover:underline">
            {entry.title}
          </Link>
        </h2>
        <p className="text-ink-muted">{entry.symptom}</p>
      </div>
      <div className="flex flex-wrap gap-x-6 gap-y-2">
        <p>
          <span className="font-semibold">Published: </span>
          {entry.latestPublished
            ? `v${entry.latestPublished.version}, ${formatWhen(entry.latestPublished.publishedAt)}`
            : 'not yet'}
        </p>
        <p>
          <span className="font-semibold">Draft: </span>
          {entry.draft
            ? `v${entry.draft.version} open, saved ${formatWhen(entry.draft.updatedAt)}`
            : 'none open'}
        </p>
      </div>
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">Versions of {entry.title}</caption>
        <thead className="sr-only sm:not-sr-only">
          <tr className="border-b-2 border-line-strong text-sm">
            <th scope="col" className="py-1 pr-3 font-semibold">
              Version
            </th>
            <th scope="col" className="py-1 pr-3 font-semibold">
              Status
            </th>
            <th scope="col" className="py-1 pr-3 font-semibold">
              Published by
            </th>
            <th scope="col" className="py-1 pr-3 font-semibold">
              Change note
            </th>
            <th scope="col" className="py-1 text-right font-semibold">
              Cases
            </th>
          </tr>
        </thead>
        <tbody>
          {versions.map((version) => (
            <tr key={version.id} className="border-b border-line align-top">
              <th scope="row" className="py-2 pr-3 font-semibold">
                v{version.version}
              </th>
              <td className="py-2 pr-3">
                <Badge tone={statusTones[version.status]}>{statusWords[version.status]}</Badge>
              </td>
              <td className="py-2 pr-3">
                {version.publishedBy ? (
                  <>
                    {version.publishedBy.name}
                    <span className="block text-sm text-ink-muted">
                      {formatWhen(version.publishedAt)}
                    </span>
                  </>
                ) : version.publishedAt ? (
                  <>
                    Heatpath
                    <span className="block text-sm text-ink-muted">
                      {formatWhen(version.publishedAt)}
                    </span>
                  </>
                ) : (
                  '—'
                )}
              </td>
              <td className="py-2 pr-3">{version.changeNote ?? '—'}</td>
              <td className="py-2 text-right">
                {version.caseCount}
                <span className="sr-only"> cases</span>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <div className="flex flex-wrap gap-3">
        {entry.draft ? (
          <ButtonLink to={`/trees/${entry.id}/draft`} variant="primary">
            Edit draft v{entry.draft.version}
            <span className="sr-only"> of {entry.title}</span>
          </ButtonLink>
        ) : (
          <Button
            busy={startDraft.isPending}
            busyLabel="Starting…"
            onClick={() =>
              startDraft.mutate(
                { treeId: entry.id },
                { onSuccess: () => void navigate(`/trees/${entry.id}/draft`) },
              )
            }
          >
            Start a draft<span className="sr-only"> of {entry.title}</span>
          </Button>
        )}
        <ButtonLink to={`/trees/${entry.id}`}>
          Versions<span className="sr-only"> of {entry.title}</span>
        </ButtonLink>
        <Button variant="secondary" aria-expanded={copying} onClick={() => setCopying(!copying)}>
          Copy<span className="sr-only"> {entry.title}</span>
        </Button>
        {neverPublished && !confirmDelete ? (
          <Button variant="danger" onClick={() => setConfirmDelete(true)}>
            Delete<span className="sr-only"> {entry.title}</span>
          </Button>
        ) : null}
      </div>
      {neverPublished && confirmDelete ? (
        <Alert tone="caution" title={`Delete “${entry.title}”?`} role="alert">
          <p>It was never published, so no case used it. Its draft is lost for good.</p>
          <div className="flex flex-wrap gap-3">
            <Button
              variant="danger"
              busy={deleteTree.isPending}
              busyLabel="Deleting…"
              onClick={() => deleteTree.mutate(entry.id)}
            >
              Yes, delete the tree
            </Button>
            <Button variant="secondary" onClick={() => setConfirmDelete(false)}>
              Keep it
            </Button>
          </div>
          {deleteTree.isError ? <p className="font-semibold">{deleteTree.error.message}</p> : null}
        </Alert>
      ) : null}
      {startDraft.isError ? (
        <Alert tone="danger" title="Draft not started" role="alert">
          <p>{startDraft.error.message}</p>
        </Alert>
      ) : null}
      {copying ? (
        <form
          aria-label={`Copy ${entry.title}`}
          className="flex flex-col gap-3 rounded-control bg-sunken p-4 sm:flex-row sm:items-end"
          onSubmit={(event) => {
            event.preventDefault();
            createTree.mutate(
              { mode: 'copy', fromTreeId: entry.id, title: copyTitle.trim() },
              { onSuccess: (created) => void navigate(`/trees/${created.treeId}/draft`) },
            );
          }}
        >
          <div className="flex-1">
            <TextField
              label="Title of the copy"
              value={copyTitle}
              required
              minLength={3}
              maxLength={160}
              error={createTree.error?.message}
              onChange={(event) => setCopyTitle(event.target.value)}
            />
          </div>
          <Button type="submit" busy={createTree.isPending} busyLabel="Copying…">
            Make the copy
          </Button>
        </form>
      ) : null}
    </article>
  );
}
