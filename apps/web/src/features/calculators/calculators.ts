// The calculators Heatpath offers, in the order a cooling job usually needs them.
export const calculatorIds = [
  'protection',
  'mix',
  'boiling',
  'temperature-drop',
  'pressure-test',
  'heat-flow',
] as const;

export type CalculatorId = (typeof calculatorIds)[number];

export interface CalculatorInfo {
  id: CalculatorId;
  title: string;
  summary: string;
}

export const calculators: Record<CalculatorId, CalculatorInfo> = {
  protection: {
    id: 'protection',
    title: 'Coolant protection',
    summary: 'Frost protection from a refractometer reading or a known mix strength.',
  },
  mix: {
    id: 'mix',
    title: 'Mix adjustment',
    summary: 'How much to drain and refill to bring the mix to the strength you want.',
  },
  boiling: {
    id: 'boiling',
    title: 'Boiling margin',
    summary: 'Where water boils at the cap’s rating, and how close the engine runs to it.',
  },
  'temperature-drop': {
    id: 'temperature-drop',
    title: 'Temperature drop',
    summary: 'Judge the difference across the radiator, engine or heater core.',
  },
  'pressure-test': {
    id: 'pressure-test',
    title: 'Pressure test',
    summary: 'Read a cold system’s pressure hold: holds, slow leak or fast leak.',
  },
  'heat-flow': {
    id: 'heat-flow',
    title: 'Heat flow',
    summary: 'Heat the coolant carries away, from its flow and the temperatures either side.',
  },
};

export function isCalculatorId(value: string | undefined): value is CalculatorId {
  return (calculatorIds as readonly string[]).includes(value ?? '');
}
