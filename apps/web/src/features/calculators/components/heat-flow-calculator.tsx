// Heat flow: the heat the coolant gives up across a part, Q = ṁ·cp·ΔT, with the handbook's
// density and specific heat at the mean temperature. Figures are rounded for display by the
// coolant package's helper; the package keeps full precision.
import { heatFlow, type HeatFlowResult } from '@heatpath/coolant';
import { useState } from 'react';
import { SegmentedChoice } from '../../../components/ui/segmented-choice';
import { calculate, errorFor, type Calculation } from '../calculation';
import { show, showPercent, showSignificant } from '../format';
import { useUnits } from '../hooks/use-units';
import { percentText, quantityText, unitSymbol, type DisplayUnits } from '../units';
import { HotSystemCaution, RunningEngineCaution } from './cautions';
import {
  GlycolField,
  knownGlycol,
  NumberField,
  UnknownGlycolWarning,
  type GlycolAnswer,
} from './fields';
import { Details, Headline, ResultPanel, Sources, Warnings } from './result-parts';
import { UnitToggles } from './unit-toggles';

type Basis = 'volume' | 'mass';

export function HeatFlowCalculator() {
  const { units } = useUnits();
  const [answer, setAnswer] = useState<GlycolAnswer>('');
  const [percent, setPercent] = useState('50');
  const [basis, setBasis] = useState<Basis>('volume');
  const [flow, setFlow] = useState('');
  const [inlet, setInlet] = useState('');
  const [outlet, setOutlet] = useState('');

  const glycol = knownGlycol(answer);
  const boxes = [
    { field: 'percent', label: 'the concentration', value: percent },
    { field: 'litresPerMinute', label: 'the flow', value: flow },
    { field: 'inletCelsius', label: 'the inlet temperature', value: inlet },
    { field: 'outletCelsius', label: 'the outlet temperature', value: outlet },
  ];
  const calculation: Calculation<HeatFlowResult> =
    glycol === null
      ? {
          state: 'waiting',
          missing: ['the glycol', ...boxes.filter((b) => !b.value.trim()).map((b) => b.label)],
        }
      : calculate(boxes, () =>
          heatFlow({
            glycol,
            percent: percentText(percent),
            basis,
            litresPerMinute: quantityText(flow, units.volumeFlow),
            inletCelsius: quantityText(inlet, units.temperature),
            outletCelsius: quantityText(outlet, units.temperature),
          }),
        );

  return (
    <div className="grid gap-6 lg:grid-cols-2 lg:items-start">
      <form className="flex flex-col gap-5" onSubmit={(event) => event.preventDefault()}>
        <UnitToggles kinds={['temperature', 'volume']} />
        <p className="rounded-control bg-sunken p-3 text-sm">
          Works for plain water, and ethylene or propylene glycol up to 60 vol %, at a mean coolant
          temperature of 0–120 °C (handbook tables to 100 °C, carried on in a straight line above).
          Outside that it says why instead of guessing.
        </p>
        <GlycolField
          value={answer}
          onChange={setAnswer}
          hint="Ethylene or propylene glycol: density and specific heat differ."
          error={errorFor(calculation, 'glycol')}
        />
        <NumberField
          label="Concentration"
          hint="0 for plain water."
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
        <NumberField
          label="Coolant flow"
          hint="From a flow meter in the circuit."
          unit={unitSymbol(units.volumeFlow)}
          value={flow}
          onChange={setFlow}
          error={errorFor(calculation, 'litresPerMinute')}
        />
        <NumberField
          label="Inlet temperature"
          unit={unitSymbol(units.temperature)}
          value={inlet}
          onChange={setInlet}
          error={errorFor(calculation, 'inletCelsius')}
        />
        <NumberField
          label="Outlet temperature"
          unit={unitSymbol(units.temperature)}
          value={outlet}
          onChange={setOutlet}
          error={errorFor(calculation, 'outletCelsius')}
        />
      </form>

      <ResultPanel
        calculation={calculation}
        blocked={answer === 'unknown' ? <UnknownGlycolWarning /> : undefined}
        cautions={
          <>
            <RunningEngineCaution />
            <HotSystemCaution />
          </>
        }
      >
        {calculation.state === 'done' ? (
          <HeatFlowResultView result={calculation.result} units={units} />
        ) : null}
      </ResultPanel>
    </div>
  );
}

function HeatFlowResultView({ result, units }: { result: HeatFlowResult; units: DisplayUnits }) {
  const gives = result.kilowatts >= 0;
  return (
    <>
      <Headline
        label={gives ? 'Heat given up by the coolant' : 'Heat taken up by the coolant'}
        value={showSignificant(Math.abs(result.kilowatts), 'heatFlow')}
      />
      <Details
        rows={[
          {
            term: 'Temperature drop',
            value: show(
              result.temperatureDropKelvin,
              'temperatureDifference',
              units.temperatureDifference,
            ),
          },
          {
            term: 'Mean temperature',
            value: show(result.meanCelsius, 'temperature', units.temperature),
          },
          { term: 'Mix strength', value: showPercent(result.volumePercent, 'volume') },
          { term: 'Density', value: showSignificant(result.densityKgPerCubicMetre, 'density') },
          {
            term: 'Specific heat',
            value: showSignificant(result.specificHeatJPerKgK, 'specificHeat'),
          },
          { term: 'Mass flow', value: showSignificant(result.massFlowKgPerSecond, 'massFlow') },
        ]}
      />
      <Warnings warnings={result.warnings} />
      <Sources sources={result.sources} />
    </>
  );
}
