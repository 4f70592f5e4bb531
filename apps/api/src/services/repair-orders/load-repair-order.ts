// Loads what every repair-order operation starts from: a diagnosed (or closed) case of the
// caller's workshop with its vehicle, customer, tree version and technician, and its findings.
import type { Transaction } from 'sequelize';
import { formatWithUnit, unitCodes } from '@heatpath/fault-tree';
import type { UnitCode } from '@heatpath/fault-tree';
import { Finding, User, Workshop } from '../../db/models/index';
import type { DiagnosticCase } from '../../db/models/index';
import { AppError, notFound } from '../../errors';
import type { Actor } from '../../policies/permissions';
import { findCase } from '../cases/find-case';

export interface RepairOrderCase {
  kase: DiagnosticCase;
  finding: Finding;
  workshop: Workshop;
  technician: User | null;
}

export async function loadRepairOrderCase(options: {
  actor: Actor;
  caseId: string;
  transaction?: Transaction;
  lock?: boolean;
}): Promise<RepairOrderCase> {
  const { actor, transaction } = options;
  const kase = await findCase({ ...options, withDetails: true });
  if (kase.status !== 'diagnosed' && kase.status !== 'closed')
    throw new AppError(
      'conflict',
      'This case is not diagnosed yet: the technician is still working on its findings.',
    );
  const [finding, workshop, creator] = await Promise.all([
    Finding.findOne({ where: { caseId: kase.id }, transaction }),
    Workshop.findByPk(actor.workshopId, { transaction }),
    kase.assignee ? null : User.findByPk(kase.createdBy, { transaction }),
  ]);
  if (!finding || !workshop) throw notFound('The findings of that case');
  return { kase, finding, workshop, technician: kase.assignee ?? creator };
}

/** A stored reading as a person reads it: "110 °C". */
export function readingDisplay(value: number, unit: string): string {
  return (unitCodes as readonly string[]).includes(unit)
    ? formatWithUnit(value, unit as UnitCode)
    : `${value} ${unit}`.trim();
}

/** The title the tree gives a node (an outcome), or its id when the tree has none. */
export function nodeTitle(definition: unknown, nodeId: string | null): string | null {
  if (!nodeId) return null;
  const nodes = (definition as { nodes?: Record<string, { title?: unknown }> } | null)?.nodes;
  const title = nodes?.[nodeId]?.title;
  return typeof title === 'string' ? title : null;
}

export const treeTitle = (definition: unknown): string => {
  const title = (definition as { title?: unknown } | null)?.title;
  return typeof title === 'string' ? title : '';
};
