// Cases for component tests, built from a shipped tree by the fault-tree package itself, so the
// walk a test shows is exactly what the API would send for the same answers.
import type { CaseDetail, Findings } from '@heatpath/contracts';
import {
  compileTree,
  summariseWalk,
  type CompiledTree,
  type WalkEvent,
} from '@heatpath/fault-tree';
import { overheatsIntermittentTree } from '@heatpath/fault-tree/trees';

let compiled: CompiledTree | undefined;

function tree(): CompiledTree {
  if (compiled) return compiled;
  const result = compileTree(overheatsIntermittentTree);
  if (!result.ok) throw new Error('The shipped tree does not compile.');
  compiled = result.tree;
  return compiled;
}

export const caseId = '00000000-0000-4000-8000-0000000000c1';
const versionId = '00000000-0000-4000-8000-0000000000d1';

export type Answer =
  string | Record<string, { value: number; unit: string }> | 'done' | 'could-not-do';

/** The events that answer the walk from its start with the given answers, in order. */
export function eventsFor(answers: readonly Answer[]): WalkEvent[] {
  const events: WalkEvent[] = [];
  for (const answer of answers) {
    const walk = summariseWalk(tree(), events);
    const node = walk.currentNode;
    const base = { nodeId: walk.currentNodeId, position: walk.position };
    if (node.kind === 'question' && typeof answer === 'string') {
      events.push({ type: 'answer.choice', ...base, choiceId: answer });
    } else if (node.kind === 'procedure' && (answer === 'done' || answer === 'could-not-do')) {
      events.push({ type: 'answer.procedure', ...base, result: answer });
    } else if (node.kind === 'measurement' && typeof answer === 'object') {
      events.push({
        type: 'answer.measurement',
        ...base,
        readings: answer as Record<string, { value: number; unit: 'degC' }>,
      });
    } else {
      throw new Error(`Answer ${JSON.stringify(answer)} does not fit step ${walk.currentNodeId}.`);
    }
  }
  return events;
}

const r = (value: number, unit: string) => ({ value, unit });

const blockTest: Answer[] = [
  'idle-or-traffic',
  { topUpLitres: r(0.3, 'L') },
  'none-seen',
  'ethylene',
  { egPercent: r(50, '%') },
  { capRating: r(1.2, 'bar'), capOpening: r(1.2, 'bar'), capHeldAfterMinute: r(1.15, 'bar') },
  'vacuum-valve-ok',
  { testPressure: r(1.2, 'bar'), pressureAfterHold: r(1.18, 'bar'), holdMinutes: r(15, 'min') },
];

const hoseTemps: Answer[] = [
  ...blockTest,
  'done',
  'no-gas',
  { liveDataTemp: r(105, 'degC'), sensorHousingIr: r(103, 'degC') },
];
const outcome: Answer[] = [
  ...hoseTemps,
  {
    engineTempAtHoses: r(105, 'degC'),
    radiatorInletTemp: r(75, 'degC'),
    radiatorOutletTemp: r(70, 'degC'),
  },
  'circulates',
  'done',
  'opened',
  { thermostatRated: r(87, 'degC'), thermostatOpenedAt: r(99, 'degC') },
];

export const paths = { start: [] as Answer[], blockTest, hoseTemps, outcome };

export function makeFindings(overrides: Partial<Findings> = {}): Findings {
  return {
    outcomeNodeId: 'thermostat-stuck-closed',
    concern: 'Runs hot in traffic.',
    cause: 'The thermostat opens late.',
    correction: 'Fit a new thermostat and seal, refill and bleed.',
    parts: [{ description: 'Thermostat with seal', quantity: 1, partNumber: null }],
    labour: [{ operation: 'Replace thermostat, refill and bleed', hours: 1.2 }],
    followUps: ['Recheck the level after the first drive.'],
    readings: [],
    revision: 1,
    updatedAt: '2025-03-01T09:30:00.000Z',
    updatedBy: { id: '00000000-0000-4000-8000-000000000002', name: 'Tomas Brand' },
    ...overrides,
  };
}

export function makeCaseDetail(
  answers: readonly Answer[] = [],
  overrides: Partial<CaseDetail> = {},
): CaseDetail {
  const walk = summariseWalk(tree(), eventsFor(answers));
  return {
    id: caseId,
    number: 7,
    reference: 'C-00007',
    status: answers.length > 0 ? 'in_diagnosis' : 'open',
    complaint: 'Runs hot in traffic.',
    symptom: overheatsIntermittentTree.symptom,
    mileageAtIntake: 118650,
    mileageUnit: 'km',
    vehicle: {
      id: '00000000-0000-4000-8000-0000000000e1',
      vin: null,
      vinWarning: null,
      plate: 'HL17 KVR',
      make: 'Corvane',
      model: 'Tessel 1.4T',
      year: 2017,
      engine: null,
      fuel: 'petrol',
      mileage: 118400,
      mileageUnit: 'km',
      customer: null,
    },
    customer: {
      id: '00000000-0000-4000-8000-0000000000f1',
      name: 'Morwenna Tregarth',
      phone: null,
      email: null,
    },
    assignee: { id: '00000000-0000-4000-8000-000000000002', name: 'Tomas Brand' },
    createdAt: '2025-03-01T08:00:00.000Z',
    updatedAt: '2025-03-01T08:00:00.000Z',
    diagnosedAt: null,
    tree: {
      treeId: '00000000-0000-4000-8000-0000000000a9',
      versionId,
      version: 1,
      title: overheatsIntermittentTree.title,
      definition: overheatsIntermittentTree,
    },
    walk,
    notes: [],
    attachments: [],
    findings: null,
    can: { walk: true, editFindings: true, markDiagnosed: false },
    ...overrides,
  };
}

/** The walk after the given answers, as the API's reply to the last of them. */
export function walkAfter(answers: readonly Answer[]) {
  return summariseWalk(tree(), eventsFor(answers));
}

/** The walk after exactly these events (steps back included). */
export function walkOf(events: readonly WalkEvent[]) {
  return summariseWalk(tree(), events);
}
