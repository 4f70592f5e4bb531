// Builds the repair order of one approved revision in Heatpath's export format (version 1),
// the one source every export (PDF, CSV, JSON) and e-mail is made from. An approved revision is
// frozen, so the same revision always makes the same repair order.
import { Op } from 'sequelize';
import {
  REPAIR_ORDER_FORMAT,
  REPAIR_ORDER_FORMAT_VERSION,
  repairOrderExportSchema,
} from '@heatpath/contracts';
import type { RepairOrderExport } from '@heatpath/contracts';
import { Attachment, FindingsRevision, User } from '../../db/models/index';
import { AppError } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { caseReference } from '../../lib/case-reference';
import { nodeTitle, readingDisplay, treeTitle } from '../../lib/tree-text';
import { loadRepairOrderCase } from './load-repair-order';

export interface RepairOrderPhotoRef {
  id: string;
  name: string;
  mediaType: string;
  storageKey: string;
}

export interface BuiltRepairOrder {
  document: RepairOrderExport;
  photos: RepairOrderPhotoRef[];
}

export async function buildRepairOrder(options: {
  actor: Actor;
  caseId: string;
  /** An approved revision; without it, the newest approved one. */
  revision?: number;
}): Promise<BuiltRepairOrder> {
  const { actor } = options;
  assertCan(actor, 'findings.review');
  const { kase, workshop, technician } = await loadRepairOrderCase(options);
  const vehicle = kase.vehicle;
  const version = kase.treeVersion;
  if (!vehicle || !version) throw new Error('buildRepairOrder needs the case details.');
  const revision = await FindingsRevision.findOne({
    where: {
      caseId: kase.id,
      workshopId: actor.workshopId,
      approvedAt: { [Op.ne]: null },
      ...(options.revision ? { revision: options.revision } : {}),
    },
    include: [{ model: User, as: 'approver' }],
    order: [['revision', 'DESC']],
  });
  if (!revision?.approvedAt)
    throw new AppError(
      'conflict',
      options.revision
        ? `Revision ${options.revision} is not approved; only an approved revision goes into a repair order.`
        : 'No revision of these findings is approved yet; approve one to export or send it.',
    );
  const photoRows = revision.photoIds.length
    ? await Attachment.findAll({
        where: {
          id: { [Op.in]: revision.photoIds },
          caseId: kase.id,
          workshopId: actor.workshopId,
          kind: 'photo',
        },
      })
    : [];
  const photos = revision.photoIds.flatMap((id) => photoRows.filter((p) => p.id === id));
  const document: RepairOrderExport = {
    format: REPAIR_ORDER_FORMAT,
    version: REPAIR_ORDER_FORMAT_VERSION,
    generatedAt: new Date().toISOString(),
    workshop: { name: workshop.name },
    case: {
      id: kase.id,
      reference: caseReference(kase.number),
      complaint: kase.complaint,
      openedAt: kase.createdAt.toISOString(),
      diagnosedAt: kase.diagnosedAt ? kase.diagnosedAt.toISOString() : null,
      technician: technician ? { name: technician.name } : null,
    },
    vehicle: {
      plate: vehicle.plate,
      vin: vehicle.vin,
      make: vehicle.make,
      model: vehicle.model,
      year: vehicle.year,
      engine: vehicle.engine,
      mileageAtIntake:
        kase.mileageAtIntake === null
          ? null
          : { value: kase.mileageAtIntake, unit: kase.mileageUnit },
    },
    customer: kase.customer
      ? { name: kase.customer.name, phone: kase.customer.phone, email: kase.customer.email }
      : null,
    findings: {
      revision: revision.revision,
      approvedAt: revision.approvedAt.toISOString(),
      approvedBy: { name: revision.approver?.name ?? 'Unknown' },
      outcome: {
        nodeId: revision.outcomeNodeId,
        title: nodeTitle(version.definition, revision.outcomeNodeId) ?? revision.outcomeNodeId,
      },
      concern: revision.concern,
      cause: revision.cause,
      correction: revision.correction,
    },
    parts: revision.parts.map((p, i) => ({
      line: i + 1,
      description: p.description,
      quantity: p.quantity,
      partNumber: p.partNumber ?? null,
    })),
    labour: revision.labour.map((l, i) => ({
      line: i + 1,
      operation: l.operation,
      hours: l.hours,
    })),
    followUps: [...revision.followUps],
    readings: revision.readings.map((r) => ({
      label: r.label,
      value: r.value,
      unit: r.unit,
      display: readingDisplay(r.value, r.unit),
    })),
    photos: photos.map((p) => ({
      id: p.id,
      name: p.originalName,
      mediaType: p.mediaType,
      width: p.width,
      height: p.height,
    })),
    tree: { id: version.treeId, title: treeTitle(version.definition), version: version.version },
  };
  // The format is a promise to integrations: never hand out a file that breaks it.
  repairOrderExportSchema.parse(document);
  return {
    document,
    photos: photos.map((p) => ({
      id: p.id,
      name: p.originalName,
      mediaType: p.mediaType,
      storageKey: p.storageKey,
    })),
  };
}

/** "C-00012-repair-order-r3.pdf": the case reference names every file. */
export const repairOrderFilename = (document: RepairOrderExport, extension: string) =>
  `${document.case.reference}-repair-order-r${document.findings.revision}.${extension}`;
