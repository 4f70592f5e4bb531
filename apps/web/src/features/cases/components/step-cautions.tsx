// A step's cautions, each as the app's one safety-note style and always before the instruction,
// so nobody reads "open the cap" before "only on a cold system".
import type { Caution } from '@heatpath/fault-tree';
import { SafetyNote } from '../../../components/ui/alert';
import { hazardLabels } from '../case-format';

export function StepCautions({ cautions }: { cautions: readonly Caution[] }) {
  if (cautions.length === 0) return null;
  return (
    <div className="flex flex-col gap-3" data-testid="step-cautions">
      {cautions.map((caution) => (
        <SafetyNote key={`${caution.hazard}:${caution.text}`}>
          <p>
            <span className="font-bold">{hazardLabels[caution.hazard]}. </span>
            {caution.text}
          </p>
        </SafetyNote>
      ))}
    </div>
  );
}
