// A step's cautions in the app's one safety-note style, always before the instruction, so nobody
// reads "open the cap" before "only on a cold system". All of a step's cautions sit in one note,
// each led by its hazard, so a step with three of them still leaves its instruction in view.
import type { Caution } from '@heatpath/fault-tree';
import { hazardLabels } from '../../lib/step-labels';
import { SafetyNote } from '../ui/alert';

export function StepCautions({ cautions }: { cautions: readonly Caution[] }) {
  if (cautions.length === 0) return null;
  return (
    <div data-testid="step-cautions">
      <SafetyNote>
        <ul className="flex flex-col gap-2">
          {cautions.map((caution) => (
            <li key={`${caution.hazard}:${caution.text}`}>
              <span className="font-bold">{hazardLabels[caution.hazard]}. </span>
              {caution.text}
            </li>
          ))}
        </ul>
      </SafetyNote>
    </div>
  );
}
