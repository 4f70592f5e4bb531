// What the editor shows when a save is refused because someone else saved the draft first: the
// choice to reload their copy or to compare, and the comparison side by side. Nothing is
// overwritten until the lead picks "Keep mine" after seeing what it replaces.
import type { TreeVersionDetail } from '@heatpath/contracts';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { compareDrafts } from '../compare-drafts';
import { normaliseDefinition, type EditableTree } from '../draft-model';

interface SaveConflictProps {
  message: string;
  mine: EditableTree;
  /** Their copy, once fetched for a comparison. */
  theirs: TreeVersionDetail | null;
  loading: boolean;
  error: string | null;
  onReloadTheirs: () => void;
  onCompare: () => void;
  onKeepMine: () => void;
}

export function SaveConflict({
  message,
  mine,
  theirs,
  loading,
  error,
  onReloadTheirs,
  onCompare,
  onKeepMine,
}: SaveConflictProps) {
  const comparison = theirs ? compareDrafts(normaliseDefinition(theirs.definition), mine) : null;
  return (
    <Alert tone="danger" title="Not saved: someone else saved this draft" role="alert">
      <p>{message}</p>
      <p>Your changes are still on this screen. Choose what to do with them:</p>
      <div className="flex flex-wrap gap-3">
        <Button
          variant="secondary"
          onClick={onReloadTheirs}
          busy={loading && !theirs}
          busyLabel="Loading theirs…"
        >
          Reload theirs
        </Button>
        {comparison ? null : (
          <Button variant="secondary" onClick={onCompare} disabled={loading}>
            Compare
          </Button>
        )}
      </div>
      {error ? <p className="font-semibold">{error}</p> : null}
      {comparison && theirs ? (
        <section aria-label="Their draft and yours" className="flex flex-col gap-3">
          <h3 className="text-lg font-bold">
            Their draft (revision {theirs.revision}) and yours, side by side
          </h3>
          {comparison.tree.length === 0 && comparison.nodes.length === 0 ? (
            <p>The two copies are the same.</p>
          ) : (
            <div className="overflow-x-auto">
              <table className="w-full border-collapse text-left">
                <thead>
                  <tr className="border-b-2 border-current">
                    <th scope="col" className="py-2 pr-3">
                      What
                    </th>
                    <th scope="col" className="py-2 pr-3">
                      Theirs
                    </th>
                    <th scope="col" className="py-2">
                      Yours
                    </th>
                  </tr>
                </thead>
                <tbody>
                  {comparison.tree.map((row) => (
                    <tr key={row.field} className="border-b border-current/40 align-top">
                      <th scope="row" className="py-2 pr-3 font-semibold">
                        Tree {row.field}
                      </th>
                      <td className="py-2 pr-3">{row.theirs}</td>
                      <td className="py-2">{row.mine}</td>
                    </tr>
                  ))}
                  {comparison.nodes.map((row) => (
                    <tr key={row.nodeId} className="border-b border-current/40 align-top">
                      <th scope="row" className="py-2 pr-3 font-semibold">
                        Step <code className="font-mono">{row.nodeId}</code>
                      </th>
                      <td className="py-2 pr-3">
                        {row.theirs === null
                          ? 'Not in theirs'
                          : row.mine === null
                            ? `“${row.theirs}” — only in theirs`
                            : `“${row.theirs}” — differs in: ${row.fields.join(', ')}`}
                      </td>
                      <td className="py-2">
                        {row.mine === null
                          ? 'Not in yours'
                          : row.theirs === null
                            ? `“${row.mine}” — only in yours`
                            : `“${row.mine}” — differs in: ${row.fields.join(', ')}`}
                      </td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          )}
          <div className="flex flex-wrap gap-3">
            <Button variant="secondary" onClick={onReloadTheirs}>
              Reload theirs
            </Button>
            <Button variant="danger" onClick={onKeepMine}>
              Keep mine and save over theirs
            </Button>
          </div>
        </section>
      ) : null}
    </Alert>
  );
}
