// Pressure test: reads a cold system's pressure hold into the package's verdict.
import { pressureTest, type PressureTestResult, type PressureTestVerdict } from '@heatpath/coolant';
import { useState } from 'react';
import { calculate, errorFor, type Calculation } from '../calculation';
import { show } from '../format';
import { useUnits } from '../hooks/use-units';
import { quantityText, unitSymbol, type DisplayUnits } from '../units';
import { HotSystemCaution, PressureTesterCaution } from './cautions';
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

export const pressureVerdicts: Record<PressureTestVerdict, { label: string; tone: VerdictTone }> = {
  holds: { label: 'Holds pressure', tone: 'ok' },
  'slow-leak': { label: 'Slow leak', tone: 'caution' },
  'fast-leak': { label: 'Clear leak', tone: 'danger' },
  'not-at-rating': { label: 'Not tested at the cap rating', tone: 'caution' },
  'too-short': { label: 'Hold too short to judge', tone: 'caution' },
  'pressure-rose': { label: 'Pressure rose: still warming', tone: 'caution' },
};

export function PressureTestCalculator() {
  const { units } = useUnits();
  const [cap, setCap] = useState('');
  const [start, setStart] = useState('');
  const [end, setEnd] = useState('');
  const [minutes, setMinutes] = useState('');

  const calculation: Calculation<PressureTestResult> = calculate(
    [
      { field: 'capRatingBar', label: 'the cap rating', value: cap },
      { field: 'startBar', label: 'the pressure at the start', value: start },
      { field: 'endBar', label: 'the pressure at the end', value: end },
      { field: 'minutes', label: 'the minutes held', value: minutes },
    ],
    () =>
      pressureTest({
        capRatingBar: quantityText(cap, units.pressure),
        startBar: quantityText(start, units.pressure),
        endBar: quantityText(end, units.pressure),
        minutes: quantityText(minutes, 'min'),
      }),
  );

  const pressureUnit = unitSymbol(units.pressure);
  return (
    <div className="grid gap-6 lg:grid-cols-2 lg:items-start">
      <form className="flex flex-col gap-5" onSubmit={(event) => event.preventDefault()}>
        <UnitToggles kinds={['pressure']} />
        <NumberField
          label="Cap rating"
          hint="Gauge pressure stamped on the cap (1.4–1.6 bar is common on modern cars); pump to this, never above."
          unit={pressureUnit}
          value={cap}
          onChange={setCap}
          error={errorFor(calculation, 'capRatingBar')}
        />
        <NumberField
          label="Pressure at the start"
          unit={pressureUnit}
          value={start}
          onChange={setStart}
          error={errorFor(calculation, 'startBar')}
        />
        <NumberField
          label="Pressure at the end"
          unit={pressureUnit}
          value={end}
          onChange={setEnd}
          error={errorFor(calculation, 'endBar')}
        />
        <NumberField
          label="Minutes held"
          hint="Hold for 10–30 minutes."
          unit="min"
          value={minutes}
          onChange={setMinutes}
          error={errorFor(calculation, 'minutes')}
        />
      </form>

      <ResultPanel
        calculation={calculation}
        cautions={
          <>
            <PressureTesterCaution />
            <HotSystemCaution />
          </>
        }
      >
        {calculation.state === 'done' ? (
          <PressureResult result={calculation.result} units={units} />
        ) : null}
      </ResultPanel>
    </div>
  );
}

function PressureResult({ result, units }: { result: PressureTestResult; units: DisplayUnits }) {
  const verdict = pressureVerdicts[result.verdict];
  return (
    <>
      <Verdict tone={verdict.tone} label={verdict.label} />
      <Details
        rows={[
          { term: 'Fall', value: show(result.dropBar, 'pressure', units.pressure) },
          {
            term: 'Rate',
            value: `${show(result.dropBarPerMinute, 'pressureRate', units.pressure)} a minute`,
          },
          {
            term: 'Counted as no change',
            value: `within ${show(result.rule.thresholds.noChangeBar, 'pressure', units.pressure)}`,
          },
        ]}
      />
      <p>{result.explanation}</p>
      <Warnings warnings={result.warnings} />
      <Rule text={result.rule.text} />
      <Sources sources={[result.rule.source]} />
    </>
  );
}
