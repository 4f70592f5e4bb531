// A training case as the casebook lists it: the symptom, the difficulty, the car (never its plate
// or VIN), how many steps, and the learner's own attempts and best score — never the answer.
import type { CasebookEntry } from '@heatpath/contracts';
import { Link } from 'react-router';
import { Badge } from '../../../components/ui/badge';
import {
  countText,
  difficultyMark,
  difficultyText,
  scoreText,
  trainingVehicleName,
} from '../training-format';

export function DifficultyBadge({ entry }: { entry: Pick<CasebookEntry, 'difficulty'> }) {
  return (
    <Badge>
      <span aria-hidden="true" className="mr-1.5 tracking-tight">
        {difficultyMark(entry.difficulty)}
      </span>
      {difficultyText(entry.difficulty)}
    </Badge>
  );
}

export function CasebookCard({ entry, position }: { entry: CasebookEntry; position?: number }) {
  return (
    <Link
      to={`/casebook/${encodeURIComponent(entry.id)}`}
      className="flex h-full flex-col gap-2 rounded-panel border-2 border-line-strong bg-surface p-4 hover:bg-sunken"
    >
      <span className="flex flex-wrap items-start justify-between gap-2">
        <span className="text-lg font-bold">
          {position !== undefined ? `${position}. ` : ''}
          {entry.symptom}
        </span>
        <DifficultyBadge entry={entry} />
      </span>
      <span>“{entry.complaint}”</span>
      <span className="text-ink-muted">{trainingVehicleName(entry.vehicle)}</span>
      <span className="text-sm text-ink-muted">
        {countText(entry.stepCount, 'step', 'steps')} · {entry.treeTitle}
      </span>
      <span className="mt-auto pt-1 font-semibold">
        {entry.attempts === 0
          ? 'Not tried yet'
          : `${countText(entry.attempts, 'attempt', 'attempts')} · best ${entry.bestScore ? scoreText(entry.bestScore) : 'not finished yet'}`}
      </span>
    </Link>
  );
}
