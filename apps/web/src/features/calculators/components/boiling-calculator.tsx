// Boiling margin: where water boils at the cap's rating, how much margin the running temperature
// leaves, and what is left if the cap stops holding.
import { boilingPoint, readCoolantTemperature, type BoilingPointResult } from '@heatpath/coolant';
import { useState } from 'react';
import { calculate, errorFor, type Calculation } from '../calculation';
import { show } from '../format';
import { useUnits } from '../hooks/use-units';
import { quantityText, unitSymbol, type DisplayUnits } from '../units';
import { HotSystemCaution } from './cautions';
import { NumberField } from './fields';
import { Details, Headline, ResultPanel, Sources, Verdict, Warnings } from './result-parts';
import { UnitToggles } from './unit-toggles';

interface BoilingOutcome {
  atCap: BoilingPointResult;
  unpressurised: BoilingPointResult;
  runningCelsius: number | null;
}

export function BoilingCalculator() {
  const { units } = useUnits();
  const [cap, setCap] = useState('');
  const [running, setRunning] = useState('');

  const calculation: Calculation<BoilingOutcome> = calculate(
    [{ field: 'gaugeBar', label: 'the cap rating', value: cap }],
    () => ({
      atCap: boilingPoint({ gaugeBar: quantityText(cap, units.pressure) }),
      unpressurised: boilingPoint({ gaugeBar: 0 }),
      runningCelsius: running.trim()
        ? readCoolantTemperature(quantityText(running, units.temperature), 'running')
        : null,
    }),
  );

  return (
    <div className="grid gap-6 lg:grid-cols-2 lg:items-start">
      <form className="flex flex-col gap-5" onSubmit={(event) => event.preventDefault()}>
        <UnitToggles kinds={['temperature', 'pressure']} />
        <NumberField
          label="Cap rating"
          hint="Gauge pressure, usually stamped on the cap (1.4–1.6 bar is common on modern cars)."
          unit={unitSymbol(units.pressure)}
          value={cap}
          onChange={setCap}
          error={errorFor(calculation, 'gaugeBar')}
        />
        <NumberField
          label="Running coolant temperature"
          hint="Optional: from live data or a probe, to see the margin left."
          unit={unitSymbol(units.temperature)}
          value={running}
          onChange={setRunning}
          error={errorFor(calculation, 'running')}
        />
      </form>

      <ResultPanel calculation={calculation} cautions={<HotSystemCaution />}>
        {calculation.state === 'done' ? (
          <BoilingResult outcome={calculation.result} units={units} />
        ) : null}
      </ResultPanel>
    </div>
  );
}

function BoilingResult({ outcome, units }: { outcome: BoilingOutcome; units: DisplayUnits }) {
  const { atCap, unpressurised, runningCelsius } = outcome;
  const margin = runningCelsius === null ? null : atCap.celsius - runningCelsius;
  return (
    <>
      <Headline
        label="Water boils at the cap’s rating at"
        value={show(atCap.celsius, 'boilingPoint', units.temperature)}
        note={`At ${show(atCap.gaugeBar, 'pressure', units.pressure)} gauge.`}
      />
      {/* No published margin counts as "enough", so the margin is stated, not judged; only
          reaching the boiling point itself is flagged. */}
      {margin !== null && margin <= 0 ? (
        <Verdict tone="danger" label="At or above water’s boiling point at this pressure" />
      ) : null}
      <Details
        rows={[
          ...(margin !== null && margin > 0
            ? [
                {
                  term: 'Margin to boiling',
                  value: show(margin, 'boilingMargin', units.temperatureDifference),
                },
              ]
            : []),
          {
            term: 'If the cap stops holding',
            value: `boils at ${show(unpressurised.celsius, 'boilingPoint', units.temperature)}`,
          },
          {
            term: 'Absolute pressure',
            value: show(atCap.absoluteBar, 'pressure', units.pressure),
          },
        ]}
      />
      <p className="rounded-control bg-sunken p-3">{atCap.mixStatement}</p>
      <Warnings warnings={atCap.warnings} />
      <Sources sources={[atCap.source]} />
    </>
  );
}
