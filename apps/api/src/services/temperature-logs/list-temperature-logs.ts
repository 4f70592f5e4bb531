// The temperature logs of one case, oldest first, without their series (the list needs only the
// headline figures kept with each log).
import type { TemperatureLogList } from '@heatpath/contracts';
import { Attachment, TemperatureLog, User } from '../../db/models/index';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { presentLogSummary } from '../../presenters/temperature-log.presenter';
import { findCase } from '../cases/find-case';
import { seriesAttributes } from './find-temperature-log';

export async function listTemperatureLogs(options: {
  actor: Actor;
  caseId: string;
}): Promise<TemperatureLogList> {
  const { actor, caseId } = options;
  assertCan(actor, 'logs.read');
  const kase = await findCase({ actor, caseId });
  const logs = await TemperatureLog.findAll({
    where: { caseId: kase.id, workshopId: actor.workshopId },
    attributes: { exclude: [...seriesAttributes] },
    include: [
      { model: Attachment, as: 'attachment', required: true },
      { model: User, as: 'uploader' },
    ],
    order: [
      ['createdAt', 'ASC'],
      ['id', 'ASC'],
    ],
  });
  return {
    logs: logs.flatMap((log) =>
      log.attachment ? [presentLogSummary(log, log.attachment, log.uploader)] : [],
    ),
  };
}
