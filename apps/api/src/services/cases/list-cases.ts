// The case list: the caller's workshop only, newest first, filtered, searched, and paged by
// keyset (created_at, id) so page 500 costs what page 1 does.
import { Op } from 'sequelize';
import type { WhereOptions } from 'sequelize';
import type { CaseListQuery } from '@heatpath/contracts';
import { z } from 'zod';
import { Customer, DiagnosticCase, User, Vehicle } from '../../db/models/index';
import { database } from '../../db/with-transaction';
import { AppError } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';

const cursorSchema = z.object({ t: z.iso.datetime(), id: z.uuid() });

export const encodeCursor = (c: DiagnosticCase) =>
  Buffer.from(JSON.stringify({ t: c.createdAt.toISOString(), id: c.id })).toString('base64url');

function decodeCursor(cursor: string) {
  try {
    return cursorSchema.parse(JSON.parse(Buffer.from(cursor, 'base64url').toString('utf8')));
  } catch {
    throw new AppError(
      'bad_request',
      'That page link is not valid; start again from the first page.',
    );
  }
}

export async function listCases(options: { actor: Actor; query: CaseListQuery }) {
  const { actor, query } = options;
  assertCan(actor, 'cases.read');
  const sequelize = database();
  const conditions: WhereOptions[] = [{ workshopId: actor.workshopId }];
  if (query.scope === 'mine') conditions.push({ assignedTo: actor.userId });
  if (query.technicianId) conditions.push({ assignedTo: query.technicianId });
  if (query.status) conditions.push({ status: query.status });
  if (query.q) {
    const term = query.q.toLowerCase().replace(/[%_\\]/g, '\\$&');
    conditions.push({ searchText: { [Op.like]: `%${term}%` } });
  }
  if (query.cursor) {
    const c = decodeCursor(query.cursor);
    conditions.push(
      sequelize.literal(
        `("DiagnosticCase"."created_at", "DiagnosticCase"."id") < (${sequelize.escape(c.t)}::timestamptz, ${sequelize.escape(c.id)}::uuid)`,
      ) as unknown as WhereOptions,
    );
  }
  const rows = await DiagnosticCase.findAll({
    where: { [Op.and]: conditions },
    include: [
      { model: Vehicle, as: 'vehicle' },
      { model: Customer, as: 'customer' },
      { model: User, as: 'assignee' },
    ],
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit: query.limit + 1,
  });
  const page = rows.slice(0, query.limit);
  const last = page[page.length - 1];
  return { cases: page, nextCursor: rows.length > query.limit && last ? encodeCursor(last) : null };
}
