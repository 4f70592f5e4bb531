// Coolant protection: how far down the coolant protects, from what the refractometer shows — a
// freezing point on the glycol's own scale, or a concentration — or from a known mix.
import {
  concentrationForFreezePoint,
  freezePoint,
  toCanonical,
  type ConcentrationForFreezePointResult,
  type FreezePointResult,
} from '@heatpath/coolant';
import { useState } from 'react';
import { SegmentedChoice } from '../../../components/ui/segmented-choice';
import { calculate, errorFor, type Calculation } from '../calculation';
import { show, showPercent } from '../format';
import { useUnits } from '../hooks/use-units';
import { percentText, quantityText, unitSymbol, type DisplayUnits } from '../units';
import { GlycolCaution, HotSystemCaution } from './cautions';
import {
  GlycolField,
  knownGlycol,
  NumberField,
  UnknownGlycolWarning,
  type GlycolAnswer,
} from './fields';
import { Details, Headline, ResultPanel, Sources, Warnings } from './result-parts';
import { UnitToggles } from './unit-toggles';

type Reading = 'freeze-point' | 'concentration';
type Basis = 'volume' | 'mass';

type Outcome =
  | { kind: 'from-freeze-point'; readingCelsius: number; result: ConcentrationForFreezePointResult }
  | { kind: 'from-concentration'; result: FreezePointResult };

export function ProtectionCalculator() {
  const { units } = useUnits();
  const [answer, setAnswer] = useState<GlycolAnswer>('');
  const [reading, setReading] = useState<Reading>('freeze-point');
  const [freezeText, setFreezeText] = useState('');
  const [percent, setPercent] = useState('');
  const [basis, setBasis] = useState<Basis>('volume');

  const glycol = knownGlycol(answer);
  const readingBox =
    reading === 'freeze-point'
      ? { field: 'celsius', label: 'the freeze point reading', value: freezeText }
      : { field: 'percent', label: 'the concentration', value: percent };
  const calculation: Calculation<Outcome> =
    glycol === null
      ? {
          state: 'waiting',
          missing: ['the glycol', ...(readingBox.value.trim() ? [] : [readingBox.label])],
        }
      : calculate([readingBox], () => {
          if (reading === 'freeze-point') {
            const typed = quantityText(freezeText, units.temperature);
            return {
              kind: 'from-freeze-point',
              // The reading itself is the protection; the package reads its unit.
              readingCelsius: toCanonical(typed, 'temperature', 'celsius'),
              result: concentrationForFreezePoint({ glycol, celsius: typed, basis: 'volume' }),
            };
          }
          return {
            kind: 'from-concentration',
            result: freezePoint({ glycol, percent: percentText(percent), basis }),
          };
        });

  return (
    <div className="grid gap-6 lg:grid-cols-2 lg:items-start">
      <form className="flex flex-col gap-5" onSubmit={(event) => event.preventDefault()}>
        <UnitToggles kinds={['temperature']} />
        <GlycolField
          value={answer}
          onChange={setAnswer}
          hint="Refractometers have a separate scale for each glycol; reading the wrong one is off by 10 K or more (ASTM D3321)."
        />
        <SegmentedChoice
          legend="The refractometer shows"
          choices={[
            { value: 'freeze-point', label: 'Freeze point' },
            { value: 'concentration', label: 'Concentration' },
          ]}
          value={reading}
          onChange={setReading}
        />
        {reading === 'freeze-point' ? (
          <NumberField
            label="Freeze point reading"
            hint={
              glycol
                ? `Read on the ${glycol === 'propylene' ? 'PG' : 'EG'} scale. Below zero: tap ± or type a minus.`
                : 'Choose the glycol first, then read its scale.'
            }
            unit={unitSymbol(units.temperature)}
            value={freezeText}
            onChange={setFreezeText}
            error={errorFor(calculation, 'celsius')}
            signed
          />
        ) : (
          <>
            <NumberField
              label="Concentration"
              hint="The glycol’s share of the coolant."
              unit="%"
              value={percent}
              onChange={setPercent}
              error={errorFor(calculation, 'percent')}
            />
            <SegmentedChoice
              legend="Concentration is"
              choices={[
                { value: 'volume', label: 'by volume' },
                { value: 'mass', label: 'by mass' },
              ]}
              value={basis}
              onChange={setBasis}
            />
          </>
        )}
      </form>

      <ResultPanel
        calculation={calculation}
        blocked={answer === 'unknown' ? <UnknownGlycolWarning /> : undefined}
        cautions={
          <>
            <HotSystemCaution />
            <GlycolCaution />
          </>
        }
      >
        {calculation.state === 'done' ? (
          <ProtectionResult outcome={calculation.result} units={units} />
        ) : null}
      </ResultPanel>
    </div>
  );
}

function ProtectionResult({ outcome, units }: { outcome: Outcome; units: DisplayUnits }) {
  const { result } = outcome;
  const celsius =
    outcome.kind === 'from-freeze-point' ? outcome.readingCelsius : outcome.result.celsius;
  return (
    <>
      <Headline
        label="Protected down to"
        value={celsius === null ? 'No figure' : show(celsius, 'freezePoint', units.temperature)}
        note={
          celsius === null
            ? undefined
            : 'Refractometer readings are good to about ±1 K (ASTM D3321).'
        }
      />
      {result.volumePercent !== null && result.massPercent !== null ? (
        <Details
          rows={[
            { term: 'Mix strength', value: showPercent(result.volumePercent, 'volume') },
            { term: 'Same mix by mass', value: showPercent(result.massPercent, 'mass') },
          ]}
        />
      ) : null}
      <Warnings warnings={result.warnings} />
      <Sources sources={[result.source]} />
    </>
  );
}
