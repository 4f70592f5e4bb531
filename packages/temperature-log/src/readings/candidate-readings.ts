// Turns an analysis into readings a measurement step of the walk can offer. They are
// candidates only: the technician sees each with how it was found and confirms it (or types
// their own) before the walk uses it. Units and quantities use the codes of the tree format
// (degC, min, K, none), and `matchesInputs` names the inputs of Heatpath's shipped trees that
// ask for that reading, so the app can offer it on the right step.
import type { CANONICAL_UNITS, Quantity } from '@heatpath/coolant';
import type { TemperatureLogAnalysis } from '../analysis/analyse-temperature-log.js';
import type { ResultBasis } from '../analysis/result-basis.js';

export type CandidateReadingName =
  | 'thermostatOpeningC'
  | 'warmUpMinutes'
  | 'minutesToTargetC'
  | 'peakCoolantC'
  | 'settledCoolantC'
  | 'ambientC'
  | 'overTemperatureEpisodes'
  | 'longestOverTemperatureMinutes'
  | 'swingAmplitudeK';

/** The quantities a log yields a reading of; each reading is in its quantity's canonical unit. */
type CandidateQuantity = Extract<Quantity, 'temperature' | 'time' | 'temperatureDelta' | 'number'>;

export interface CandidateReading {
  readonly name: CandidateReadingName;
  readonly value: number;
  readonly unit: (typeof CANONICAL_UNITS)[CandidateQuantity];
  readonly quantity: CandidateQuantity;
  readonly label: string;
  /** Where on the log the value comes from, s; null for a value over the whole log. */
  readonly atSeconds: number | null;
  /** Inputs of the shipped trees this reading answers. */
  readonly matchesInputs: readonly string[];
  readonly basis: ResultBasis;
  /** Always true: no candidate is used before the technician confirms it. */
  readonly needsConfirmation: true;
}

// The slow-warm-up step asks for 60 minutes when live data never reached 80 °C.
const NEVER_REACHED_MINUTES = 60;

function round1(value: number): number {
  return Math.round(value * 10) / 10;
}

export function candidateReadings(analysis: TemperatureLogAnalysis): CandidateReading[] {
  const out: CandidateReading[] = [];
  const add = (
    r: Omit<CandidateReading, 'needsConfirmation' | 'value'> & { value: number },
  ): void => {
    out.push({ ...r, value: round1(r.value), needsConfirmation: true });
  };

  const { opening, warmUp, timeToTarget, peak, settled, ambient, overTemperature, swings } =
    analysis;
  if (opening.found) {
    add({
      name: 'thermostatOpeningC',
      value: opening.temperatureC,
      unit: 'degC',
      quantity: 'temperature',
      label: 'Thermostat opening temperature, estimated from the log',
      atSeconds: opening.atSeconds,
      matchesInputs: [],
      basis: opening.basis,
    });
  }
  if (warmUp.found) {
    add({
      name: 'warmUpMinutes',
      value: warmUp.seconds / 60,
      unit: 'min',
      quantity: 'time',
      label: 'Warm-up time to the thermostat opening',
      atSeconds: warmUp.openingSeconds,
      matchesInputs: [],
      basis: warmUp.basis,
    });
  }
  const fitsSlowWarmUp = timeToTarget.targetC === 80 ? ['minutesTo80'] : [];
  if (timeToTarget.found) {
    add({
      name: 'minutesToTargetC',
      value: timeToTarget.seconds / 60,
      unit: 'min',
      quantity: 'time',
      label: `Time to reach ${timeToTarget.targetC} °C`,
      atSeconds: timeToTarget.seconds,
      matchesInputs: fitsSlowWarmUp,
      basis: timeToTarget.basis,
    });
  } else if (
    analysis.log.durationSeconds >= NEVER_REACHED_MINUTES * 60 &&
    peak.valueC < timeToTarget.targetC
  ) {
    add({
      name: 'minutesToTargetC',
      value: NEVER_REACHED_MINUTES,
      unit: 'min',
      quantity: 'time',
      label: `Never reached ${timeToTarget.targetC} °C in an hour of log (the step asks for ${NEVER_REACHED_MINUTES})`,
      atSeconds: null,
      matchesInputs: fitsSlowWarmUp,
      basis: timeToTarget.basis,
    });
  }
  add({
    name: 'peakCoolantC',
    value: peak.valueC,
    unit: 'degC',
    quantity: 'temperature',
    label: 'Highest coolant temperature in the log',
    atSeconds: peak.atSeconds,
    matchesInputs: ['liveDataTemp'],
    basis: peak.basis,
  });
  if (settled.found) {
    add({
      name: 'settledCoolantC',
      value: settled.medianC,
      unit: 'degC',
      quantity: 'temperature',
      label: 'Settled coolant temperature after the opening',
      atSeconds: null,
      matchesInputs: ['settledTemp'],
      basis: settled.basis,
    });
  }
  if (ambient.found) {
    add({
      name: 'ambientC',
      value: ambient.medianC,
      unit: 'degC',
      quantity: 'temperature',
      label: 'Ambient temperature during the log',
      atSeconds: null,
      matchesInputs: ['ambientTemp'],
      basis: ambient.basis,
    });
  }
  add({
    name: 'overTemperatureEpisodes',
    value: overTemperature.episodes.length,
    unit: 'none',
    quantity: 'number',
    label: `Episodes at or above ${overTemperature.thresholdC} °C for ${overTemperature.minEpisodeSeconds} s or more`,
    atSeconds: null,
    matchesInputs: [],
    basis: overTemperature.basis,
  });
  const longest = [...overTemperature.episodes].sort(
    (a, b) => b.durationSeconds - a.durationSeconds,
  )[0];
  if (longest !== undefined) {
    add({
      name: 'longestOverTemperatureMinutes',
      value: longest.durationSeconds / 60,
      unit: 'min',
      quantity: 'time',
      label: `Longest time at or above ${overTemperature.thresholdC} °C`,
      atSeconds: longest.startSeconds,
      matchesInputs: [],
      basis: overTemperature.basis,
    });
  }
  const widest = [...swings.episodes].sort((a, b) => b.amplitudeK - a.amplitudeK)[0];
  if (widest !== undefined) {
    add({
      name: 'swingAmplitudeK',
      value: widest.amplitudeK,
      unit: 'K',
      quantity: 'temperatureDelta',
      label: `Temperature swing, peak to trough (every ${Math.round(widest.periodSeconds)} s)`,
      atSeconds: widest.startSeconds,
      matchesInputs: [],
      basis: swings.basis,
    });
  }
  return out;
}
