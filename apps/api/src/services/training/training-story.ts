// A training case as its story: each step as it happened (question, answer, readings with the
// values computed from them, photos, notes, cautions), the outcome and the findings — built
// field by field from an allowlist, with the customer's personal data taken out of free text.
import { Op } from 'sequelize';
import { computedViews, planPredictions } from '@heatpath/fault-tree';
import type { CompiledTree, PlannedPrediction, WalkSummary } from '@heatpath/fault-tree';
import type {
  CasebookEntry,
  TrainingFindings,
  TrainingOutcome,
  TrainingPhoto,
  TrainingStep,
  TrainingValue,
} from '@heatpath/contracts';
import { Attachment, CaseEvent, Finding } from '../../db/models/index';
import { compiledTreeOf } from '../../lib/compiled-trees';
import { walkOf } from '../cases/walk-state';
import type { LoadedTrainingCase } from './find-training-case';
import { redacter } from './redact';

export interface TrainingStory {
  entry: Omit<CasebookEntry, 'attempts' | 'bestScore'>;
  teachingNote: string;
  steps: TrainingStep[];
  plans: (PlannedPrediction | null)[];
  outcome: TrainingOutcome;
  findings: TrainingFindings | null;
}

function photoOf(trainingCaseId: string, a: Attachment): TrainingPhoto {
  const base = `/api/training/cases/${trainingCaseId}/photos/${a.id}`;
  return {
    id: a.id,
    // The original file name may carry a plate; the date taken says enough.
    name: `Photo ${a.createdAt.toISOString().slice(0, 10)}`,
    nodeId: a.nodeId,
    url: `${base}/file`,
    thumbnailUrl: a.thumbnailKey ? `${base}/thumbnail` : null,
  };
}

function outcomeOf(tree: CompiledTree, walk: WalkSummary): TrainingOutcome {
  const nodeId = walk.outcome?.id ?? walk.currentNodeId;
  const node = tree.nodes.get(nodeId);
  if (node?.kind !== 'outcome') throw new Error(`training case walk ends at ${nodeId}`);
  return {
    nodeId,
    title: node.title,
    rootCause: node.rootCause,
    correction: node.correction,
    parts: node.parts.map((p) => ({ description: p.description, quantity: p.quantity })),
    labour: node.labour.map((l) => ({ operation: l.operation, hours: l.hours })),
    followUps: [...node.followUps],
  };
}

function promptOf(tree: CompiledTree, nodeId: string): string {
  const node = tree.nodes.get(nodeId);
  if (node?.kind === 'question' || node?.kind === 'measurement') return node.prompt;
  if (node?.kind === 'procedure') return node.instruction;
  return '';
}

/** Builds the story; only attachments that are photos and not hidden by the lead are shown. */
export async function trainingStoryOf(training: LoadedTrainingCase): Promise<TrainingStory> {
  const kase = training.case;
  const tree = compiledTreeOf(kase.treeVersion);
  const customer = kase.customer ?? kase.vehicle.customer ?? null;
  const redact = redacter({
    customerName: customer?.name,
    phone: customer?.phone,
    email: customer?.email,
    plate: kase.vehicle.plate,
    vin: kase.vehicle.vin,
  });
  const [walk, noteEvents, photos, finding] = await Promise.all([
    walkOf(kase),
    training.hideNotes
      ? Promise.resolve([])
      : CaseEvent.findAll({ where: { caseId: kase.id, kind: 'note' }, order: [['seq', 'ASC']] }),
    Attachment.findAll({
      where: {
        caseId: kase.id,
        kind: 'photo',
        ...(training.hiddenAttachmentIds.length > 0
          ? { id: { [Op.notIn]: training.hiddenAttachmentIds } }
          : {}),
      },
      order: [['createdAt', 'ASC']],
    }),
    Finding.findOne({ where: { caseId: kase.id } }),
  ]);
  if (walk.status !== 'reached-outcome') throw new Error('a training case must be finished');

  const onPath = new Set(walk.path.map((entry) => entry.nodeId));
  const lastIndex = walk.path.length - 1;
  // Notes and photos not tied to a step of the path belong with the last step.
  const stepOf = (nodeId: string | null) =>
    nodeId !== null && onPath.has(nodeId) ? nodeId : walk.path[lastIndex]?.nodeId;

  const values: Record<string, number> = {};
  let known = new Set<string>();
  const steps = walk.path.map((entry, index): TrainingStep => {
    const node = tree.nodes.get(entry.nodeId);
    const readings: TrainingValue[] =
      entry.answer.kind === 'measurement'
        ? entry.answer.readings.map((r) => ({ label: r.label, display: r.display }))
        : [];
    if (entry.answer.kind === 'measurement')
      for (const r of entry.answer.readings) values[r.name] = r.canonical.value;
    const computedNow = computedViews(tree, values).filter((c) => c.value !== null);
    const computed = computedNow
      .filter((c) => !known.has(c.name))
      .map((c) => ({ label: c.label, display: c.display ?? '' }));
    known = new Set(computedNow.map((c) => c.name));
    const next = tree.nodes.get(entry.to);
    const isLast = index === lastIndex;
    return {
      index,
      nodeId: entry.nodeId,
      kind: entry.kind,
      title: entry.title,
      prompt: promptOf(tree, entry.nodeId),
      hazards: node && node.kind !== 'outcome' ? [...node.hazards] : [],
      cautions: node && node.kind !== 'outcome' ? node.cautions.map((c) => ({ ...c })) : [],
      answer:
        entry.answer.kind === 'measurement'
          ? { kind: 'measurement', readings }
          : { kind: entry.answer.kind, label: entry.answer.label },
      computed,
      photos: photos
        .filter((p) => stepOf(p.nodeId) === entry.nodeId && (isLast || p.nodeId !== null))
        .map((p) => photoOf(training.id, p)),
      notes: noteEvents
        .filter((n) => stepOf(n.nodeId) === entry.nodeId && (isLast || n.nodeId !== null))
        .map((n) => redact(String((n.payload as { text?: unknown }).text ?? ''))),
      routeLabel: entry.routeLabel,
      next: next ? { nodeId: entry.to, kind: next.kind, title: next.title } : null,
      why: node && node.kind !== 'outcome' && node.notes ? node.notes : null,
    };
  });

  const definition = tree.definition;
  return {
    entry: {
      id: training.id,
      symptom: kase.symptom,
      complaint: redact(kase.complaint),
      treeTitle: definition.title,
      difficulty: training.difficulty,
      vehicle: {
        make: kase.vehicle.make,
        model: kase.vehicle.model,
        year: kase.vehicle.year,
        engine: kase.vehicle.engine,
        fuel: kase.vehicle.fuel,
        mileageAtIntake: kase.mileageAtIntake,
        mileageUnit: kase.mileageUnit,
      },
      stepCount: steps.length,
    },
    teachingNote: training.teachingNote,
    steps,
    plans: planPredictions(tree, walk.path),
    outcome: outcomeOf(tree, walk),
    findings: finding
      ? {
          concern: redact(finding.concern),
          cause: redact(finding.cause),
          correction: redact(finding.correction),
          parts: finding.parts.map((p) => ({
            description: redact(p.description),
            quantity: p.quantity,
          })),
          labour: finding.labour.map((l) => ({ operation: redact(l.operation), hours: l.hours })),
          followUps: finding.followUps.map(redact),
        }
      : null,
  };
}
