// A lead creates a tree: from scratch, as a copy of another, or by importing a definition file.
// The new tree starts as a draft (version 1); a draft with problems is kept and listed, and can
// be fixed before it is published.
import type { CreateTreeRequest } from '@heatpath/contracts';
import { validateTree } from '@heatpath/fault-tree';
import { Op } from 'sequelize';
import type { Transaction } from 'sequelize';
import { Tree, TreeVersion } from '../../db/models/index';
import { AppError } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { blankTree, keyFromTitle } from './blank-tree';
import { findTree } from './find-tree';
import { withTransaction } from '../../db/with-transaction';

interface Envelope {
  id: string;
  title: string;
  symptom: string;
}

function envelopeOf(definition: unknown): Envelope | null {
  if (!definition || typeof definition !== 'object') return null;
  const d = definition as Record<string, unknown>;
  const ok =
    typeof d.id === 'string' &&
    typeof d.title === 'string' &&
    typeof d.symptom === 'string' &&
    d.title.trim() &&
    d.symptom.trim();
  return ok
    ? {
        id: d.id as string,
        title: (d.title as string).slice(0, 200),
        symptom: (d.symptom as string).slice(0, 300),
      }
    : null;
}

async function freeKey(
  workshopId: string,
  wanted: string,
  transaction: Transaction,
): Promise<string> {
  const base = wanted.slice(0, 70);
  const taken = new Set(
    (
      await Tree.findAll({
        where: { workshopId, key: { [Op.like]: `${base}%` } },
        attributes: ['key'],
        transaction,
      })
    ).map((t) => t.key),
  );
  if (!taken.has(base)) return base;
  for (let n = 2; ; n += 1) if (!taken.has(`${base}-${n}`)) return `${base}-${n}`;
}

export async function createTree(options: { actor: Actor; input: CreateTreeRequest }) {
  const { actor, input } = options;
  assertCan(actor, 'trees.edit');
  return withTransaction(async (transaction) => {
    let definition: Record<string, unknown>;
    if (input.mode === 'blank') {
      const key = await freeKey(actor.workshopId, keyFromTitle(input.title), transaction);
      definition = blankTree({ key, title: input.title, symptom: input.symptom });
    } else if (input.mode === 'copy') {
      const source = await findTree({ actor, treeId: input.fromTreeId, transaction });
      const latest = await TreeVersion.findOne({
        where: { treeId: source.id },
        order: [['version', 'DESC']],
        transaction,
      });
      if (!latest) throw new AppError('conflict', 'That tree has no version to copy.');
      const key = await freeKey(actor.workshopId, keyFromTitle(input.title), transaction);
      definition = {
        ...(structuredClone(latest.definition) as Record<string, unknown>),
        id: key,
        title: input.title,
      };
    } else {
      const envelope = envelopeOf(input.definition);
      if (!envelope) {
        const problems = validateTree(input.definition);
        throw new AppError(
          'validation_failed',
          `This file is not a Heatpath tree: it needs at least an id, a title and a symptom. ${problems.length} problem(s) found.`,
          Object.fromEntries(problems.slice(0, 50).map((p, i) => [`problem.${i}`, p.message])),
        );
      }
      const key = await freeKey(actor.workshopId, keyFromTitle(envelope.id), transaction);
      definition = { ...(input.definition as Record<string, unknown>), id: key };
    }
    const envelope = envelopeOf(definition);
    if (!envelope) throw new Error('created definition lacks its envelope');
    const tree = await Tree.create(
      {
        workshopId: actor.workshopId,
        key: envelope.id,
        title: envelope.title,
        symptom: envelope.symptom,
      },
      { transaction },
    );
    const draft = await TreeVersion.create(
      {
        treeId: tree.id,
        workshopId: actor.workshopId,
        version: 1,
        status: 'draft',
        definition,
        createdBy: actor.userId,
        publishedBy: null,
        publishedAt: null,
        changeNote: null,
      },
      { transaction },
    );
    return { tree, draft };
  });
}
