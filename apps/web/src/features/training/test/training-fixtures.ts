// Invented training data for the web tests: one finished case of the overheating tree, as the
// training API would answer for it. No customer, plate or VIN anywhere, as in the real answers.
import type {
  CasebookEntry,
  PredictionAsk,
  TrainingAttempt,
  TrainingCandidate,
  TrainingStep,
} from '@heatpath/contracts';

export const trainingCaseId = '00000000-0000-4000-8000-0000000000d1';
export const attemptId = '00000000-0000-4000-8000-0000000000e1';

export const entry: CasebookEntry = {
  id: trainingCaseId,
  symptom: 'Overheats now and then, no fault codes stored',
  complaint: 'Gauge climbs on long climbs; fan runs on after stopping.',
  treeTitle: 'Overheats now and then',
  difficulty: 'practised',
  vehicle: {
    make: 'Corvane',
    model: 'Tessel',
    year: 2017,
    engine: '1.4 turbo petrol',
    fuel: 'petrol',
    mileageAtIntake: 118400,
    mileageUnit: 'km',
  },
  stepCount: 2,
  attempts: 0,
  bestScore: null,
};

export const levelStep: TrainingStep = {
  index: 0,
  nodeId: 'level-check',
  kind: 'question',
  title: 'Coolant level, engine cold',
  prompt: 'With the engine cold, is the coolant between the marks?',
  hazards: ['hot-pressurised-coolant'],
  cautions: [{ hazard: 'hot-pressurised-coolant', text: 'Only open the cap on a cold system.' }],
  answer: { kind: 'choice', label: 'Yes, between the marks' },
  computed: [],
  photos: [],
  notes: ['Level fine, no sign of loss.'],
  routeLabel: null,
  next: null,
  why: null,
};

export const hoseStep: TrainingStep = {
  index: 1,
  nodeId: 'hose-temperatures',
  kind: 'measurement',
  title: 'Radiator hose temperatures at full heat',
  prompt: 'Measure the radiator inlet and outlet once the fan has run.',
  hazards: ['fan'],
  cautions: [{ hazard: 'fan', text: 'Keep hands clear of the fan; it can start on its own.' }],
  answer: {
    kind: 'measurement',
    readings: [
      { label: 'Radiator inlet', display: '104 °C' },
      { label: 'Radiator outlet', display: '62 °C' },
    ],
  },
  computed: [{ label: 'Temperature drop across the radiator', display: '42 K' }],
  photos: [],
  notes: [],
  routeLabel: null,
  next: null,
  why: null,
};

export const nextAsk: PredictionAsk = {
  kind: 'next',
  question: 'What should the technician check next?',
  options: [
    { id: 'hose-temperatures', label: 'Radiator hose temperatures' },
    { id: 'pressure-test', label: 'Pressure-test the system' },
  ],
  maxPoints: 2,
};

export const causeAsk: PredictionAsk = {
  kind: 'cause',
  question: 'What is the root cause?',
  options: [
    { id: 'pump-shroud-stuck', label: 'Switchable pump shroud stuck over the impeller' },
    { id: 'thermostat-stuck', label: 'Thermostat stuck shut' },
  ],
  maxPoints: 3,
};

const base: TrainingAttempt = {
  id: attemptId,
  trainingCaseId,
  status: 'in_progress',
  startedAt: '2025-03-10T09:00:00.000Z',
  finishedAt: null,
  score: 0,
  maxScore: 5,
  steps: [],
  current: { step: levelStep, ask: nextAsk },
  trainingCase: entry,
  teachingNote: null,
  outcome: null,
  findings: null,
};

export const attemptAtStart: TrainingAttempt = base;

export const attemptAfterFirst: TrainingAttempt = {
  ...base,
  score: 0,
  steps: [
    {
      step: {
        ...levelStep,
        routeLabel: 'Yes, between the marks',
        next: { nodeId: 'hose-temperatures', kind: 'measurement', title: hoseStep.title },
        why: 'With no coolant lost, the next question is whether coolant reaches the radiator.',
      },
      prediction: {
        ...nextAsk,
        chosenId: 'pressure-test',
        correctId: 'hose-temperatures',
        correct: false,
        points: 0,
      },
    },
  ],
  current: { step: hoseStep, ask: causeAsk },
};

export const attemptFinished: TrainingAttempt = {
  ...attemptAfterFirst,
  status: 'finished',
  finishedAt: '2025-03-10T09:06:00.000Z',
  score: 3,
  current: null,
  steps: [
    ...attemptAfterFirst.steps,
    {
      step: {
        ...hoseStep,
        routeLabel: 'Drop over 30 K with the fan running',
        next: { nodeId: 'pump-shroud-stuck', kind: 'outcome', title: 'Pump shroud stuck' },
        why: 'A hot inlet with a cold outlet means coolant barely moves: the pump is not pushing it.',
      },
      prediction: {
        ...causeAsk,
        chosenId: 'pump-shroud-stuck',
        correctId: 'pump-shroud-stuck',
        correct: true,
        points: 3,
      },
    },
  ],
  teachingNote: 'Feel both hoses before you replace a thermostat.',
  outcome: {
    nodeId: 'pump-shroud-stuck',
    title: 'Pump shroud stuck',
    rootCause:
      'The switchable pump’s shroud stays over the impeller, so coolant barely circulates.',
    correction: 'Replace the coolant pump and refill to the maker’s procedure.',
    parts: [{ description: 'Switchable coolant pump', quantity: 1 }],
    labour: [{ operation: 'Remove and refit coolant pump', hours: 3 }],
    followUps: [],
  },
  findings: {
    concern: 'Gauge climbs on long climbs.',
    cause: 'Pump shroud stuck over the impeller.',
    correction: 'Coolant pump replaced, system refilled and bled.',
    parts: [{ description: 'Switchable coolant pump', quantity: 1 }],
    labour: [{ operation: 'Remove and refit coolant pump', hours: 3 }],
    followUps: ['Drive to full temperature, let it cool, then recheck the level.'],
  },
};

export const candidate: TrainingCandidate = {
  caseId: '00000000-0000-4000-8000-0000000000c1',
  reference: 'C-00012',
  symptom: 'The temperature gauge climbs now and then.',
  treeTitle: 'Overheats now and then, no fault codes stored',
  complaint: 'Gauge climbs on long climbs.',
  vehicle: 'Corvane Tessel, 2017',
  outcomeTitle: 'Pump shroud stuck',
  diagnosedAt: '2025-03-04T09:45:00.000Z',
  notes: [{ id: '00000000-0000-4000-8000-0000000000a1', text: 'Customer asked for a call first.' }],
  photos: [
    {
      id: '00000000-0000-4000-8000-0000000000f1',
      name: 'shroud-stuck-out.png',
      thumbnailUrl: '/api/files/f1/thumb',
    },
    {
      id: '00000000-0000-4000-8000-0000000000f2',
      name: 'engine-bay-with-plate.png',
      thumbnailUrl: '/api/files/f2/thumb',
    },
  ],
};
