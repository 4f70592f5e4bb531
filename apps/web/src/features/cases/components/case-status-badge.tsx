// A case's status as a badge: the word, a mark, and a tint, never the tint alone.
import type { CaseStatus } from '@heatpath/contracts';
import { Badge } from '../../../components/ui/badge';
import { statusLabel, statusMarks, statusTones } from '../case-format';

export function CaseStatusBadge({ status }: { status: CaseStatus }) {
  return (
    <Badge tone={statusTones[status]}>
      <span aria-hidden="true" className="mr-1.5">
        {statusMarks[status]}
      </span>
      {statusLabel(status)}
    </Badge>
  );
}
