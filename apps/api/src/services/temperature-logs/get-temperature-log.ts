// One temperature log with its analysis and the readings the chart draws. The analysis at the
// default settings is stored with the log; other settings (the over-temperature threshold, the
// shortest episode) are worked out again from the stored series for this request only. A stored
// analysis made by older rules, or before the vehicle's engine description said what it says
// now, is worked out again and stored back, so the list's headline catches up too.
import type { LogDetailQuery, TemperatureLogDetail } from '@heatpath/contracts';
import { TemperatureLogError } from '@heatpath/temperature-log';
import type { AnalyseTemperatureLogOptions } from '@heatpath/temperature-log';
import { TemperatureLog } from '../../db/models/index';
import { AppError } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { presentLogDetail } from '../../presenters/temperature-log.presenter';
import { chartSeries } from './chart-series';
import { findTemperatureLog } from './find-temperature-log';
import { analyseCaseLog, engineFactsForCase, isCurrentAnalysis } from './log-analysis';
import { storedSeries } from './series-columns';

export async function getTemperatureLog(options: {
  actor: Actor;
  caseId: string;
  logId: string;
  query: LogDetailQuery;
}): Promise<TemperatureLogDetail> {
  const { actor, caseId, logId, query } = options;
  assertCan(actor, 'logs.read');
  const log = await findTemperatureLog({ actor, caseId, logId, withSeries: true });
  const series = storedSeries(log);
  const facts = await engineFactsForCase({ actor, caseId: log.caseId });
  let stored = log.analysis;
  if (!isCurrentAnalysis(stored, facts)) {
    stored = analyseCaseLog(series, facts);
    // Only if the log has not been re-read meanwhile (a new mapping moves updatedAt); silent, so
    // refreshing a derived value does not look like an edit.
    await TemperatureLog.update(
      { analysis: stored },
      {
        where: { id: log.id, workshopId: actor.workshopId, updatedAt: log.updatedAt },
        silent: true,
      },
    );
  }
  const defaults = stored.options;
  const asked: AnalyseTemperatureLogOptions = {
    ...(query.threshold !== undefined && query.threshold !== defaults.overTemperatureC
      ? { overTemperatureC: query.threshold }
      : {}),
    ...(query.minEpisodeSeconds !== undefined &&
    query.minEpisodeSeconds !== defaults.minEpisodeSeconds
      ? { minEpisodeSeconds: query.minEpisodeSeconds }
      : {}),
  };
  let analysis = stored;
  if (Object.keys(asked).length > 0) {
    try {
      analysis = analyseCaseLog(series, facts, asked);
    } catch (error) {
      if (error instanceof TemperatureLogError)
        throw new AppError('validation_failed', error.message);
      throw error;
    }
  }
  return presentLogDetail({
    log,
    attachment: log.attachment,
    uploader: log.uploader,
    analysis,
    series: chartSeries(series, { from: query.from, to: query.to, maxPoints: query.maxPoints }),
  });
}
