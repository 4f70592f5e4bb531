// Loads one temperature log of a case in the caller's workshop, or 404. Another workshop's log,
// or a log of another case, is simply not found. The series columns are read only when asked for.
import type { Transaction } from 'sequelize';
import { Attachment, TemperatureLog, User } from '../../db/models/index';
import { notFound } from '../../errors';
import type { Actor } from '../../policies/permissions';
import { logChannels } from './series-columns';

export const seriesAttributes = ['times', 'coolantC', ...logChannels] as const;

export async function findTemperatureLog(options: {
  actor: Actor;
  caseId: string;
  logId: string;
  withSeries: boolean;
  transaction?: Transaction;
}): Promise<TemperatureLog & { attachment: Attachment }> {
  const { actor, caseId, logId, withSeries, transaction } = options;
  const log = await TemperatureLog.findOne({
    where: { id: logId, caseId, workshopId: actor.workshopId },
    attributes: withSeries ? undefined : { exclude: [...seriesAttributes] },
    include: [
      { model: Attachment, as: 'attachment', required: true },
      { model: User, as: 'uploader' },
    ],
    transaction,
  });
  if (!log?.attachment) throw notFound('That temperature log');
  return log as TemperatureLog & { attachment: Attachment };
}
