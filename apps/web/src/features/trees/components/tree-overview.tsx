// One tree's page: its versions (status, who published each and when, the change note, cases
// that used it, the findings a publish confirmed as changed), export and retire, the open draft
// or a way to start one, and the choice of two versions to compare.
import type { TreeLibraryEntry, TreeVersionInfo } from '@heatpath/contracts';
import { useState } from 'react';
import { useNavigate } from 'react-router';
import { Alert } from '../../../components/ui/alert';
import { Badge } from '../../../components/ui/badge';
import { Button, ButtonLink, buttonClasses } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/field';
import { PageHeader, Panel } from '../../../components/ui/page';
import {
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableHeaderCell,
  TableRow,
} from '../../../components/ui/table';
import { useDiscardDraft } from '../api/discard-draft';
import { treeVersionExportPath } from '../api/get-tree-version';
import { useRetireVersion } from '../api/retire-version';
import { useStartDraft } from '../api/start-draft';
import { formatWhen, statusTones, statusWords, versionName } from '../tree-format';

interface TreeOverviewProps {
  tree: TreeLibraryEntry & { regressionCaseIds: string[] };
  /** Set when the lead arrives from publishing. */
  justPublished?: number | undefined;
}

export function TreeOverview({ tree, justPublished }: TreeOverviewProps) {
  const navigate = useNavigate();
  const startDraft = useStartDraft();
  const discard = useDiscardDraft();
  const [confirmDiscard, setConfirmDiscard] = useState(false);
  const versions = [...tree.versions].sort((a, b) => b.version - a.version);

  const start = (fromVersionId?: string) =>
    startDraft.mutate(
      { treeId: tree.id, ...(fromVersionId ? { fromVersionId } : {}) },
      { onSuccess: () => void navigate(`/trees/${tree.id}/draft`) },
    );

  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title={tree.title}
        lead={tree.symptom}
        action={
          tree.draft ? (
            <ButtonLink to={`/trees/${tree.id}/draft`} variant="primary" size="large">
              Edit draft v{tree.draft.version}
            </ButtonLink>
          ) : (
            <Button
              size="large"
              busy={startDraft.isPending}
              busyLabel="Starting…"
              onClick={() => start()}
            >
              Start a draft
            </Button>
          )
        }
      />
      {justPublished ? (
        <Alert tone="ok" title={`Version ${justPublished} published`} role="status">
          <p>New cases for this symptom start on it. Cases already open keep their version.</p>
        </Alert>
      ) : null}
      {startDraft.isError ? (
        <Alert tone="danger" title="Draft not started" role="alert">
          <p>{startDraft.error.message}</p>
        </Alert>
      ) : null}

      <Panel labelledBy="versions-heading">
        <h2 id="versions-heading" className="mb-4 text-xl font-bold">
          Versions
        </h2>
        <Table caption={`Versions of ${tree.title}`}>
          <TableHead>
            <TableHeaderCell>Version</TableHeaderCell>
            <TableHeaderCell>Status</TableHeaderCell>
            <TableHeaderCell>Published</TableHeaderCell>
            <TableHeaderCell>Change note</TableHeaderCell>
            <TableHeaderCell>Cases</TableHeaderCell>
            <TableHeaderCell>Actions</TableHeaderCell>
          </TableHead>
          <TableBody>
            {versions.map((version) => (
              <VersionRow
                key={version.id}
                treeId={tree.id}
                version={version}
                canStartDraft={!tree.draft}
                onStartDraft={() => start(version.id)}
              />
            ))}
          </TableBody>
        </Table>
        {tree.draft && versions.length > 1 ? (
          <div className="mt-4 flex flex-col gap-3">
            {confirmDiscard ? (
              <Alert tone="caution" title={`Discard draft v${tree.draft.version}?`} role="alert">
                <p>Its changes are lost; the published versions stay as they are.</p>
                <div className="flex flex-wrap gap-3">
                  <Button
                    variant="danger"
                    busy={discard.isPending}
                    busyLabel="Discarding…"
                    onClick={() =>
                      discard.mutate(tree.id, { onSuccess: () => setConfirmDiscard(false) })
                    }
                  >
                    Yes, discard the draft
                  </Button>
                  <Button variant="secondary" onClick={() => setConfirmDiscard(false)}>
                    Keep the draft
                  </Button>
                </div>
                {discard.isError ? <p className="font-semibold">{discard.error.message}</p> : null}
              </Alert>
            ) : (
              <div>
                <Button variant="danger" onClick={() => setConfirmDiscard(true)}>
                  Discard draft v{tree.draft.version}
                </Button>
              </div>
            )}
          </div>
        ) : null}
      </Panel>

      <CompareVersionsForm treeId={tree.id} versions={versions} />

      <Panel labelledBy="regression-set-heading">
        <h2 id="regression-set-heading" className="mb-2 text-xl font-bold">
          Regression set
        </h2>
        <p>
          {tree.regressionCaseIds.length === 0
            ? 'No cases guard this tree yet.'
            : `${tree.regressionCaseIds.length} finished case${tree.regressionCaseIds.length === 1 ? '' : 's'} guard this tree: each is replayed before a publish, and a changed finding must be confirmed.`}{' '}
          Choose them after replaying cases on “Check and publish”.
        </p>
        {tree.draft ? (
          <div className="mt-3">
            <ButtonLink to={`/trees/${tree.id}/draft/publish`}>Check and publish</ButtonLink>
          </div>
        ) : null}
      </Panel>
    </div>
  );
}

function VersionRow({
  treeId,
  version,
  canStartDraft,
  onStartDraft,
}: {
  treeId: string;
  version: TreeVersionInfo;
  canStartDraft: boolean;
  onStartDraft: () => void;
}) {
  const retire = useRetireVersion();
  const [confirming, setConfirming] = useState(false);
  const name = versionName(version);
  return (
    <TableRow muted={version.status === 'retired'}>
      <TableCell label="Version" header>
        <span className="font-semibold">v{version.version}</span>
        {version.basedOnVersion ? (
          <span className="block text-sm text-ink-muted">from v{version.basedOnVersion}</span>
        ) : null}
      </TableCell>
      <TableCell label="Status">
        <Badge tone={statusTones[version.status]}>{statusWords[version.status]}</Badge>
        {version.retiredAt ? (
          <span className="block text-sm text-ink-muted">{formatWhen(version.retiredAt)}</span>
        ) : null}
      </TableCell>
      <TableCell label="Published">
        {version.publishedBy ? (
          <>
            {version.publishedBy.name}
            <span className="block text-sm text-ink-muted">{formatWhen(version.publishedAt)}</span>
          </>
        ) : version.publishedAt ? (
          // Published by Heatpath itself when it moved the workshop to a newer shipped tree.
          <>
            Heatpath
            <span className="block text-sm text-ink-muted">{formatWhen(version.publishedAt)}</span>
          </>
        ) : (
          <span className="text-ink-muted">Saved {formatWhen(version.updatedAt)}</span>
        )}
      </TableCell>
      <TableCell label="Change note">
        {version.changeNote ?? '—'}
        {version.publishConfirmation ? (
          <span className="mt-1 block text-sm">
            <span aria-hidden="true">! </span>
            Published with {version.publishConfirmation.changedCases.length} changed finding
            {version.publishConfirmation.changedCases.length === 1 ? '' : 's'} confirmed (
            {version.publishConfirmation.changedCases.map((c) => c.reference).join(', ')})
          </span>
        ) : null}
      </TableCell>
      <TableCell label="Cases">{version.caseCount}</TableCell>
      <TableCell label="Actions">
        <div className="flex flex-wrap gap-2">
          <a
            href={treeVersionExportPath(treeId, version.id)}
            download
            className={buttonClasses('secondary')}
          >
            Export<span className="sr-only"> {name}</span>
          </a>
          {version.status === 'published' ? (
            confirming ? (
              <div className="flex flex-col gap-2 rounded-control bg-caution-bg p-2 text-caution-ink">
                <p>New cases can no longer start on {name}; open cases keep it.</p>
                <div className="flex flex-wrap gap-2">
                  <Button
                    variant="danger"
                    busy={retire.isPending}
                    busyLabel="Retiring…"
                    onClick={() => retire.mutate({ treeId, versionId: version.id })}
                  >
                    Yes, retire {name}
                  </Button>
                  <Button variant="secondary" onClick={() => setConfirming(false)}>
                    Keep it
                  </Button>
                </div>
                {retire.isError ? <p className="font-semibold">{retire.error.message}</p> : null}
              </div>
            ) : (
              <Button variant="secondary" onClick={() => setConfirming(true)}>
                Retire<span className="sr-only"> {name}</span>
              </Button>
            )
          ) : null}
          {canStartDraft && version.status !== 'draft' ? (
            <Button variant="quiet" onClick={onStartDraft}>
              New draft from {name}
            </Button>
          ) : null}
        </div>
      </TableCell>
    </TableRow>
  );
}

function CompareVersionsForm({
  treeId,
  versions,
}: {
  treeId: string;
  versions: readonly TreeVersionInfo[];
}) {
  const navigate = useNavigate();
  const options = versions.map((version) => ({
    value: version.id,
    label: `${versionName(version)} (${statusWords[version.status].toLowerCase()})`,
  }));
  const [from, setFrom] = useState(versions[1]?.id ?? versions[0]?.id ?? '');
  const [to, setTo] = useState(versions[0]?.id ?? '');
  if (versions.length < 2) return null;
  return (
    <Panel labelledBy="compare-heading">
      <form
        className="flex flex-col gap-4"
        onSubmit={(event) => {
          event.preventDefault();
          void navigate(`/trees/${treeId}/compare?${new URLSearchParams({ from, to })}`);
        }}
      >
        <h2 id="compare-heading" className="text-xl font-bold">
          Compare two versions
        </h2>
        <div className="grid gap-4 sm:grid-cols-2">
          <SelectField
            label="From version"
            options={options}
            value={from}
            onChange={(event) => setFrom(event.target.value)}
          />
          <SelectField
            label="To version"
            options={options}
            value={to}
            onChange={(event) => setTo(event.target.value)}
          />
        </div>
        <div>
          <Button type="submit" disabled={from === to}>
            Compare versions
          </Button>
        </div>
      </form>
    </Panel>
  );
}
