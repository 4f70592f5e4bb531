// Finished cases for the demo workshop, walked through the same services the screens use: one
// already in the training casebook with a course for every apprentice, and one the lead can
// still mark. Where a step requires a photo or log, an invented one is attached first, as the
// technician would. Runs right after the demo workshops are created.
import { randomUUID } from 'node:crypto';
import { Tree, User, Vehicle, Workshop } from '../models/index';
import type { Actor } from '../../policies/permissions';
import type { FileStore } from '../../lib/storage/file-store';
import { addAttachment } from '../../services/attachments/add-attachment';
import { addCaseNote } from '../../services/cases/add-case-note';
import { createCase } from '../../services/cases/create-case';
import { getCaseDetail } from '../../services/cases/get-case-detail';
import { markDiagnosed } from '../../services/cases/mark-diagnosed';
import { submitWalkEvent } from '../../services/cases/submit-walk-event';
import { saveCourse } from '../../services/training/save-course';
import { markTrainingCase } from '../../services/training/mark-training-case';
import { evidenceFile, requiredEvidence } from './demo-evidence';
import { confirmedLeakPath, overheatingTreeKey, stuckShroudPath } from './demo-walks';

const actorOf = (user: User): Actor => ({
  userId: user.id,
  workshopId: user.workshopId,
  role: user.role,
});

async function finishedCase(options: {
  technician: Actor;
  vehicleId: string;
  treeId: string;
  complaint: string;
  mileage: number;
  path: typeof stuckShroudPath;
  notes: { nodeId: string; text: string }[];
  store: FileStore;
}): Promise<string> {
  const { technician: actor, store } = options;
  const kase = await createCase({
    actor,
    input: {
      vehicleId: options.vehicleId,
      complaint: options.complaint,
      mileageAtIntake: options.mileage,
      mileageUnit: 'km',
      treeId: options.treeId,
    },
  });
  let { walk } = await getCaseDetail({ actor, caseId: kase.id });
  for (const step of options.path) {
    for (const request of requiredEvidence(walk.currentNode)) {
      const file = await evidenceFile(request, step.nodeId);
      await addAttachment({
        actor,
        caseId: kase.id,
        nodeId: step.nodeId,
        photoOnly: request.kind === 'photo',
        file: { originalName: file.originalName, bytes: file.bytes },
        store,
      });
    }
    const result = await submitWalkEvent({
      actor,
      caseId: kase.id,
      idempotencyKey: randomUUID(),
      event: { ...step.answer, nodeId: step.nodeId, position: walk.position },
    });
    walk = result.walk;
  }
  for (const note of options.notes) {
    await addCaseNote({
      actor,
      caseId: kase.id,
      input: { idempotencyKey: randomUUID(), nodeId: note.nodeId, text: note.text },
    });
  }
  await markDiagnosed({ actor, caseId: kase.id });
  return kase.id;
}

/** Seeds the finished cases of Harbour Lane Garage; does nothing if it has no technician. */
export async function seedDemoCases(deps: { store: FileStore }): Promise<void> {
  const workshop = await Workshop.findOne({ where: { name: 'Harbour Lane Garage' } });
  if (!workshop) return;
  const people = await User.findAll({ where: { workshopId: workshop.id } });
  const tech = people.find((p) => p.role === 'technician');
  const lead = people.find((p) => p.role === 'lead');
  const tree = await Tree.findOne({ where: { workshopId: workshop.id, key: overheatingTreeKey } });
  const vehicles = await Vehicle.findAll({
    where: { workshopId: workshop.id },
    order: [['plate', 'ASC']],
  });
  const [first, second] = vehicles;
  if (!tech || !lead || !tree || !first || !second) return;
  const technician = actorOf(tech);

  const shroudCaseId = await finishedCase({
    technician,
    vehicleId: first.id,
    treeId: tree.id,
    complaint: 'Temperature gauge climbs on long climbs and in summer traffic, then settles.',
    mileage: 118_400,
    path: stuckShroudPath,
    store: deps.store,
    notes: [
      {
        nodeId: 'hose-temps',
        text: 'Read on a long climb: live data 110 °C, radiator inlet only 52 °C at the same moment; heater hoses lukewarm.',
      },
      {
        nodeId: 'shroud-inspection',
        text: 'Shroud stuck out over the impeller; its control valve and wiring had tested sound.',
      },
    ],
  });
  await finishedCase({
    technician,
    vehicleId: second.id,
    treeId: tree.id,
    complaint: 'Needs topping up every week; sweet smell after a drive.',
    mileage: 96_200,
    path: confirmedLeakPath,
    store: deps.store,
    notes: [{ nodeId: 'visual-leaks', text: 'Pink crust on the lower hose clip at the pump.' }],
  });

  const leadActor = actorOf(lead);
  const marked = await markTrainingCase({
    actor: leadActor,
    request: {
      caseId: shroudCaseId,
      teachingNote:
        'Everything looked healthy until the hose temperatures: a hot engine with a barely warm radiator, read at the same moment with the thermostat surely open, and lukewarm heater hoses mean coolant is not moving. Bleeding did not help, the pump’s valve and wiring were sound and it ignored the scan tool’s command, so the pump came off.',
      difficulty: 'advanced',
      hideNotes: false,
      hiddenAttachmentIds: [],
    },
  });
  await saveCourse({
    actor: leadActor,
    request: {
      title: 'Running hot: reading the clues',
      description: 'Finished cases where an engine overheats now and then without fault codes.',
      apprenticeId: null,
      trainingCaseIds: [marked.id],
    },
  });
}
