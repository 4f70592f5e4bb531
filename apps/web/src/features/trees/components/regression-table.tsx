// The regression replay as a table: per finished case, the version it was walked on, the finding
// it reached then, and what the draft makes of the same answers — the same finding, another one,
// none, or where the answers stop fitting and why. The lead ticks the cases that guard the tree.
import type { RegressionReport, RegressionVerdict } from '@heatpath/contracts';
import { Link } from 'react-router';
import { Badge } from '../../../components/ui/badge';
import {
  Table,
  TableBody,
  TableCell,
  TableHead,
  TableHeaderCell,
  TableRow,
} from '../../../components/ui/table';
import { verdictIcons, verdictTones, verdictWords } from '../tree-format';

export function VerdictBadge({ verdict }: { verdict: RegressionVerdict }) {
  return (
    <Badge tone={verdictTones[verdict]}>
      <span aria-hidden="true">{verdictIcons[verdict]}&nbsp;</span>
      {verdictWords[verdict]}
    </Badge>
  );
}

interface RegressionTableProps {
  report: RegressionReport;
  /** The cases ticked as the regression set (the lead's choice, not yet saved). */
  chosen: ReadonlySet<string>;
  onToggle: (caseId: string, chosen: boolean) => void;
}

export function RegressionTable({ report, chosen, onToggle }: RegressionTableProps) {
  return (
    <Table caption="Finished cases replayed against the draft">
      <TableHead>
        <TableHeaderCell>Guards the tree</TableHeaderCell>
        <TableHeaderCell>Case</TableHeaderCell>
        <TableHeaderCell>Walked on</TableHeaderCell>
        <TableHeaderCell>Finding then</TableHeaderCell>
        <TableHeaderCell>With the draft</TableHeaderCell>
        <TableHeaderCell>Now reaches, or where it stops</TableHeaderCell>
      </TableHead>
      <TableBody>
        {report.results.map((result) => (
          <TableRow key={result.caseId}>
            <TableCell label="Guards the tree">
              <label className="flex min-h-touch items-center gap-3">
                <input
                  type="checkbox"
                  className="size-5 accent-primary"
                  aria-label={`Guards the tree: ${result.reference}`}
                  checked={chosen.has(result.caseId)}
                  onChange={(event) => onToggle(result.caseId, event.target.checked)}
                />
                <span aria-hidden="true" className="lg:sr-only">
                  Guards the tree
                </span>
              </label>
            </TableCell>
            <TableCell label="Case" header>
              <Link
                to={`/cases/${result.caseId}`}
                className="font-semibold whitespace-nowrap underline underline-offset-4"
              >
                {result.reference}
              </Link>
            </TableCell>
            <TableCell label="Walked on">v{result.fromVersion}</TableCell>
            <TableCell label="Finding then">
              {result.expectedOutcomeTitle ?? result.expectedOutcome ?? '—'}
            </TableCell>
            <TableCell label="With the draft">
              <VerdictBadge verdict={result.verdict} />
            </TableCell>
            <TableCell label="Now reaches, or where it stops">
              {result.divergence ? (
                <span>
                  Step {result.divergence.step}, “
                  {result.divergence.nodeTitle ?? result.divergence.nodeId}”:{' '}
                  {result.divergence.reason}
                </span>
              ) : result.verdict === 'no-outcome' ? (
                <span>
                  Stops at a step with no finding
                  {result.newOutcomeTitle ? ` (${result.newOutcomeTitle})` : ''}
                </span>
              ) : (
                <span>{result.newOutcomeTitle ?? result.newOutcome ?? '—'}</span>
              )}
            </TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
