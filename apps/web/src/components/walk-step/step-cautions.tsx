// A step's cautions in the app's one safety-note style, always before the instruction, so nobody
// reads "open the cap" before "only on a cold system". All of a step's cautions sit in one note,
// each led by its hazard, so a step with three of them still leaves its instruction in view.
// A hazard already read on an earlier step of the case (`compactHazards`) shows as one line that
// opens in place with "Read it again"; a new hazard is always in full. A caution is never hidden.
import type { Caution, HazardKind } from '@heatpath/fault-tree';
import { useId, useState } from 'react';
import { hazardLabels } from '../../lib/step-labels';
import { SafetyNote } from '../ui/alert';

interface StepCautionsProps {
  cautions: readonly Caution[];
  /** Hazards already shown earlier in the case (see hazardsShownBefore). */
  compactHazards?: ReadonlySet<HazardKind>;
}

export function StepCautions({ cautions, compactHazards }: StepCautionsProps) {
  if (cautions.length === 0) return null;
  return (
    <div data-testid="step-cautions">
      <SafetyNote>
        <ul className="flex flex-col gap-2">
          {cautions.map((caution) => (
            <li key={`${caution.hazard}:${caution.text}`}>
              {compactHazards?.has(caution.hazard) ? (
                <CompactCaution caution={caution} />
              ) : (
                <FullCaution caution={caution} />
              )}
            </li>
          ))}
        </ul>
      </SafetyNote>
    </div>
  );
}

function FullCaution({ caution }: { caution: Caution }) {
  return (
    <>
      <span className="font-bold">{hazardLabels[caution.hazard]}. </span>
      {caution.text}
    </>
  );
}

function CompactCaution({ caution }: { caution: Caution }) {
  const [open, setOpen] = useState(false);
  const textId = useId();
  return (
    <div className="flex flex-col gap-1">
      <div className="flex flex-wrap items-center justify-between gap-x-3">
        <span>
          <span className="font-bold">{hazardLabels[caution.hazard]}</span>
          {open ? null : ' — as on an earlier step'}
        </span>
        <button
          type="button"
          aria-expanded={open}
          aria-controls={textId}
          onClick={() => setOpen(!open)}
          className="min-h-touch shrink-0 rounded-control px-2 font-semibold underline underline-offset-4 hover:bg-caution-line/20"
        >
          {open ? 'Show less' : 'Read it again'}
          <span className="sr-only">: {hazardLabels[caution.hazard]}</span>
        </button>
      </div>
      <p id={textId} hidden={!open}>
        {caution.text}
      </p>
    </div>
  );
}
