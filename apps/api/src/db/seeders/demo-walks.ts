// Scripted answers for the shipped "overheats now and then" tree: the demo seed walks its
// finished cases with them and API tests walk cases the way a technician would. Readings are
// invented but physically plausible.
type Answer =
  | { type: 'answer.choice'; choiceId: string }
  | { type: 'answer.procedure'; result: 'done' | 'could-not-do' }
  | { type: 'answer.measurement'; readings: Record<string, { value: number; unit: string }> };

const c = (v: number) => ({ value: v, unit: 'degC' });
const bar = (v: number) => ({ value: v, unit: 'bar' });

/**
 * Engine at 110 °C on a long climb with the radiator inlet at 52 °C at the same moment and the
 * heater hoses lukewarm; bleeding does not help, the pump's control valve and wiring are sound,
 * the pump does not answer the scan tool's command, and the shroud is found stuck out.
 */
export const stuckShroudPath: { nodeId: string; answer: Answer }[] = [
  { nodeId: 'interview-pattern', answer: { type: 'answer.choice', choiceId: 'speed-or-load' } },
  {
    nodeId: 'level-cold',
    answer: { type: 'answer.measurement', readings: { topUpLitres: { value: 0.2, unit: 'L' } } },
  },
  { nodeId: 'visual-leaks', answer: { type: 'answer.choice', choiceId: 'none-seen' } },
  { nodeId: 'glycol-type', answer: { type: 'answer.choice', choiceId: 'ethylene' } },
  {
    nodeId: 'concentration-eg',
    answer: { type: 'answer.measurement', readings: { egPercent: { value: 50, unit: '%' } } },
  },
  {
    nodeId: 'cap-test',
    answer: {
      type: 'answer.measurement',
      readings: { capRating: bar(1.4), capOpening: bar(1.38), capHeldAfterMinute: bar(1.35) },
    },
  },
  { nodeId: 'cap-vacuum-valve', answer: { type: 'answer.choice', choiceId: 'vacuum-valve-ok' } },
  {
    nodeId: 'pressure-test',
    answer: {
      type: 'answer.measurement',
      readings: {
        testPressure: bar(1.4),
        pressureAfterHold: bar(1.38),
        holdMinutes: { value: 15, unit: 'min' },
      },
    },
  },
  { nodeId: 'block-test', answer: { type: 'answer.procedure', result: 'done' } },
  { nodeId: 'block-test-result', answer: { type: 'answer.choice', choiceId: 'no-gas' } },
  {
    nodeId: 'warm-up-live-data',
    answer: {
      type: 'answer.measurement',
      readings: { liveDataTemp: c(110), sensorHousingIr: c(106) },
    },
  },
  {
    nodeId: 'hose-temps',
    answer: {
      type: 'answer.measurement',
      readings: { engineTempAtHoses: c(110), radiatorInletTemp: c(52), radiatorOutletTemp: c(45) },
    },
  },
  {
    nodeId: 'circulation-check',
    answer: { type: 'answer.choice', choiceId: 'little-circulation' },
  },
  { nodeId: 'main-loop-bleed', answer: { type: 'answer.procedure', result: 'done' } },
  { nodeId: 'main-loop-retest', answer: { type: 'answer.choice', choiceId: 'still-no-flow' } },
  { nodeId: 'pump-type', answer: { type: 'answer.choice', choiceId: 'switchable' } },
  { nodeId: 'pump-valve-check', answer: { type: 'answer.choice', choiceId: 'circuit-good' } },
  { nodeId: 'pump-actuation-test', answer: { type: 'answer.choice', choiceId: 'no-response' } },
  { nodeId: 'pump-removal', answer: { type: 'answer.procedure', result: 'done' } },
  { nodeId: 'shroud-inspection', answer: { type: 'answer.choice', choiceId: 'stuck-out' } },
];

export const stuckShroudOutcome = 'pump-shroud-stuck';
export const overheatingTreeKey = 'overheats-intermittent-no-codes';

/** A leak seen at the first look and confirmed under pressure: a short, starter case. */
export const confirmedLeakPath: { nodeId: string; answer: Answer }[] = [
  { nodeId: 'interview-pattern', answer: { type: 'answer.choice', choiceId: 'speed-or-load' } },
  {
    nodeId: 'level-cold',
    answer: { type: 'answer.measurement', readings: { topUpLitres: { value: 0.9, unit: 'L' } } },
  },
  { nodeId: 'visual-leaks', answer: { type: 'answer.choice', choiceId: 'leak-seen' } },
  { nodeId: 'locate-visible-leak', answer: { type: 'answer.procedure', result: 'done' } },
  { nodeId: 'visible-leak-confirmed', answer: { type: 'answer.choice', choiceId: 'confirmed' } },
];
