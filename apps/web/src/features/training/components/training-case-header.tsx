// The head of the replay and attempt screens: what the screen is as the page title, then the
// case as the learner may know it — the symptom, the complaint in the customer's words, the car
// and the difficulty — and where they are in it.
import type { CasebookEntry } from '@heatpath/contracts';
import type { ReactNode } from 'react';
import { PageHeader } from '../../../components/ui/page';
import { trainingVehicleName } from '../training-format';
import { DifficultyBadge } from './casebook-card';

export function TrainingCaseHeader({
  title,
  entry,
  status,
}: {
  title: string;
  entry: CasebookEntry;
  status?: ReactNode;
}) {
  return (
    <PageHeader
      title={title}
      lead={
        <div className="flex flex-col gap-1">
          <p className="text-lg font-semibold text-ink">{entry.symptom}</p>
          <p>“{entry.complaint}”</p>
          <p className="flex flex-wrap items-center gap-x-3 gap-y-1">
            <span>{trainingVehicleName(entry.vehicle)}</span>
            <DifficultyBadge entry={entry} />
            {status ? <span className="font-semibold text-ink">{status}</span> : null}
          </p>
        </div>
      }
    />
  );
}
