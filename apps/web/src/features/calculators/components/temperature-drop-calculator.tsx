// Temperature drop: the difference across the radiator, the engine or the heater core, judged by
// the package's rule, to tell a circulation problem from an air-side one.
import {
  assessTemperatureDrop,
  type Circuit,
  type TemperatureDropResult,
  type TemperatureDropVerdict,
} from '@heatpath/coolant';
import { useState } from 'react';
import { SegmentedChoice } from '../../../components/ui/segmented-choice';
import { calculate, errorFor, type Calculation } from '../calculation';
import { show } from '../format';
import { useUnits } from '../hooks/use-units';
import { quantityText, unitSymbol, type DisplayUnits } from '../units';
import { HotSystemCaution, RunningEngineCaution } from './cautions';
import { NumberField } from './fields';
import {
  Details,
  ResultPanel,
  Rule,
  Sources,
  Verdict,
  Warnings,
  type VerdictTone,
} from './result-parts';
import { UnitToggles } from './unit-toggles';

const circuitText: Record<
  Circuit,
  { inlet: string; outlet: string; inletHint: string; outletHint: string }
> = {
  radiator: {
    inlet: 'Radiator inlet',
    outlet: 'Radiator outlet',
    inletHint: 'Top hose, where hot coolant enters the radiator.',
    outletHint: 'Bottom hose, where cooled coolant leaves.',
  },
  engine: {
    inlet: 'Into the engine',
    outlet: 'Out of the engine',
    inletHint: 'Coolant returning to the engine (pump inlet side).',
    outletHint: 'Coolant leaving the engine for the radiator.',
  },
  heater: {
    inlet: 'Heater core inlet',
    outlet: 'Heater core outlet',
    inletHint: 'Heater hose into the core, blower on full heat.',
    outletHint: 'Heater hose out of the core.',
  },
};

export const temperatureDropVerdicts: Record<
  TemperatureDropVerdict,
  { label: string; tone: VerdictTone }
> = {
  normal: { label: 'Normal difference', tone: 'ok' },
  'low-flow-suspected': { label: 'Low flow suspected', tone: 'caution' },
  'air-side-suspected': { label: 'Air side suspected', tone: 'caution' },
  implausible: { label: 'Readings do not add up', tone: 'danger' },
};

export function TemperatureDropCalculator() {
  const { units } = useUnits();
  const [circuit, setCircuit] = useState<Circuit>('radiator');
  const [inlet, setInlet] = useState('');
  const [outlet, setOutlet] = useState('');
  const text = circuitText[circuit];

  const calculation: Calculation<TemperatureDropResult> = calculate(
    [
      { field: 'inletCelsius', label: text.inlet, value: inlet },
      { field: 'outletCelsius', label: text.outlet, value: outlet },
    ],
    () =>
      assessTemperatureDrop({
        circuit,
        inletCelsius: quantityText(inlet, units.temperature),
        outletCelsius: quantityText(outlet, units.temperature),
      }),
  );

  return (
    <div className="grid gap-6 lg:grid-cols-2 lg:items-start">
      <form className="flex flex-col gap-5" onSubmit={(event) => event.preventDefault()}>
        <UnitToggles kinds={['temperature']} />
        <SegmentedChoice
          legend="Across"
          choices={[
            { value: 'radiator', label: 'Radiator' },
            { value: 'engine', label: 'Engine' },
            { value: 'heater', label: 'Heater core' },
          ]}
          value={circuit}
          onChange={setCircuit}
        />
        <NumberField
          label={text.inlet}
          hint={text.inletHint}
          unit={unitSymbol(units.temperature)}
          value={inlet}
          onChange={setInlet}
          error={errorFor(calculation, 'inletCelsius')}
        />
        <NumberField
          label={text.outlet}
          hint={text.outletHint}
          unit={unitSymbol(units.temperature)}
          value={outlet}
          onChange={setOutlet}
          error={errorFor(calculation, 'outletCelsius')}
        />
        <p className="text-sm text-ink-muted">
          Infrared thermometers read the surface: shiny metal reads low. Compare hose with hose and
          confirm a doubtful reading with a contact probe.
        </p>
      </form>

      <ResultPanel
        calculation={calculation}
        cautions={
          <>
            <RunningEngineCaution />
            <HotSystemCaution />
          </>
        }
      >
        {calculation.state === 'done' ? (
          <DropResult result={calculation.result} units={units} />
        ) : null}
      </ResultPanel>
    </div>
  );
}

function DropResult({ result, units }: { result: TemperatureDropResult; units: DisplayUnits }) {
  const verdict = temperatureDropVerdicts[result.verdict];
  const band = result.rule.normalBandKelvin;
  return (
    <>
      <Verdict tone={verdict.tone} label={verdict.label} />
      <Details
        rows={[
          {
            term: 'Difference',
            value: show(
              result.differenceKelvin,
              'temperatureDifference',
              units.temperatureDifference,
            ),
          },
          {
            term: 'Judged normal',
            value: `${show(band.min, 'temperatureDifference', units.temperatureDifference)} to ${show(band.max, 'temperatureDifference', units.temperatureDifference)}`,
          },
        ]}
      />
      <p>{result.explanation}</p>
      <Warnings warnings={result.warnings} />
      <Rule text={result.rule.text} />
      <Sources sources={[result.rule.source, result.rule.bandSource]} />
    </>
  );
}
