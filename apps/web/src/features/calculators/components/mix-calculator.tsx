// Mix adjustment: how much coolant to drain and what to refill with to bring the system to the
// strength wanted, by the package's volume balance.
import {
  advisedRange,
  freezePoint,
  mixAdjustment,
  type MixAdjustmentResult,
} from '@heatpath/coolant';
import { useState } from 'react';
import { SelectField } from '../../../components/ui/field';
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
import { Details, Headline, ResultPanel, Rule, Sources, Warnings } from './result-parts';
import { UnitToggles } from './unit-toggles';

type AddChoice = 'auto' | 'premix';

const addLiquidNames: Record<MixAdjustmentResult['addLiquid'], string> = {
  concentrate: 'concentrate',
  premix: 'premix',
  water: 'clean water (distilled or deionised if the maker asks for it)',
};

export function MixCalculator() {
  const { units } = useUnits();
  const [answer, setAnswer] = useState<GlycolAnswer>('');
  const [system, setSystem] = useState('');
  const [current, setCurrent] = useState('');
  const [target, setTarget] = useState('50');
  const [addChoice, setAddChoice] = useState<AddChoice>('auto');
  const [premix, setPremix] = useState('');

  const glycol = knownGlycol(answer);
  const boxes = [
    { field: 'systemLitres', label: 'the system capacity', value: system },
    { field: 'currentPercent', label: 'the present strength', value: current },
    { field: 'targetPercent', label: 'the strength wanted', value: target },
    ...(addChoice === 'premix'
      ? [{ field: 'addPercent', label: 'the premix strength', value: premix }]
      : []),
  ];
  const calculation: Calculation<MixAdjustmentResult> =
    glycol === null
      ? {
          state: 'waiting',
          missing: ['the glycol', ...boxes.filter((b) => !b.value.trim()).map((b) => b.label)],
        }
      : calculate(boxes, () =>
          mixAdjustment({
            glycol,
            systemLitres: quantityText(system, units.volume),
            currentPercent: percentText(current),
            targetPercent: percentText(target),
            ...(addChoice === 'premix' ? { addPercent: percentText(premix) } : {}),
          }),
        );

  return (
    <div className="grid gap-6 lg:grid-cols-2 lg:items-start">
      <form className="flex flex-col gap-5" onSubmit={(event) => event.preventDefault()}>
        <UnitToggles kinds={['temperature', 'volume']} />
        <GlycolField
          value={answer}
          onChange={setAnswer}
          hint="Top up with the same glycol that is in the system; the freezing curves differ."
        />
        <NumberField
          label="System capacity"
          hint="Total coolant, from the maker’s data."
          unit={unitSymbol(units.volume)}
          value={system}
          onChange={setSystem}
          error={errorFor(calculation, 'systemLitres')}
        />
        <NumberField
          label="Present strength"
          hint="From the refractometer, by volume."
          unit="vol %"
          value={current}
          onChange={setCurrent}
          error={errorFor(calculation, 'currentPercent')}
        />
        <NumberField
          label="Strength wanted"
          hint={
            glycol === null
              ? 'Usually 50; coolant standards ask for 40–60 vol % (ASTM D3306).'
              : `Usually 50; Heatpath advises ${advisedRange(glycol)} for this glycol (ASTM D3306 allows 40–60).`
          }
          unit="vol %"
          value={target}
          onChange={setTarget}
          error={errorFor(calculation, 'targetPercent')}
        />
        <SelectField
          label="What goes in"
          value={addChoice}
          onChange={(event) => setAddChoice(event.target.value === 'premix' ? 'premix' : 'auto')}
          options={[
            { value: 'auto', label: 'Concentrate or water, as needed' },
            { value: 'premix', label: 'Premix of known strength' },
          ]}
        />
        {addChoice === 'premix' ? (
          <NumberField
            label="Premix strength"
            unit="vol %"
            value={premix}
            onChange={setPremix}
            error={errorFor(calculation, 'addPercent')}
          />
        ) : null}
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
        {calculation.state === 'done' && glycol ? (
          <MixResult result={calculation.result} units={units} glycol={glycol} />
        ) : null}
      </ResultPanel>
    </div>
  );
}

function MixResult({
  result,
  units,
  glycol,
}: {
  result: MixAdjustmentResult;
  units: DisplayUnits;
  glycol: 'ethylene' | 'propylene';
}) {
  const amount = show(result.drainLitres, 'volume', units.volume);
  // The resulting freezing point comes from the handbook table; ask the package for its source.
  const tableSource = freezePoint({ glycol, percent: 0, basis: 'volume' }).source;
  return (
    <>
      {result.drainLitres === 0 ? (
        <Headline label="Change needed" value="None" note="The mix is already at that strength." />
      ) : (
        <Headline
          label="Drain, then refill with the same amount"
          value={amount}
          note={`Refill with ${amount} of ${addLiquidNames[result.addLiquid]}${
            result.addLiquid === 'premix' ? ` at ${showPercent(result.addPercent, 'volume')}` : ''
          }.`}
        />
      )}
      <Details
        rows={[
          { term: 'Strength after', value: showPercent(result.resultingPercent, 'volume') },
          {
            term: 'Freezes at',
            value:
              result.resultingFreezeCelsius === null
                ? 'No figure (past the table)'
                : show(result.resultingFreezeCelsius, 'freezePoint', units.temperature),
          },
        ]}
      />
      <Warnings warnings={result.warnings} />
      <Rule text={result.rule} />
      <Sources sources={[tableSource]} />
    </>
  );
}
