// One temperature log with its analysis and the readings the chart draws. The analysis at the
// default settings is stored with the log; other settings (the over-temperature threshold, the
// shortest episode) are worked out again from the stored series for this request only.
import type { LogDetailQuery, TemperatureLogDetail } from '@heatpath/contracts';
import { analyseTemperatureLog, TemperatureLogError } from '@heatpath/temperature-log';
import type { AnalyseTemperatureLogOptions } from '@heatpath/temperature-log';
import { AppError } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { presentLogDetail } from '../../presenters/temperature-log.presenter';
import { chartSeries } from './chart-series';
import { findTemperatureLog } from './find-temperature-log';
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
  const stored = log.analysis.options;
  const asked: AnalyseTemperatureLogOptions = {
    ...(query.threshold !== undefined && query.threshold !== stored.overTemperatureC
      ? { overTemperatureC: query.threshold }
      : {}),
    ...(query.minEpisodeSeconds !== undefined &&
    query.minEpisodeSeconds !== stored.minEpisodeSeconds
      ? { minEpisodeSeconds: query.minEpisodeSeconds }
      : {}),
  };
  let analysis = log.analysis;
  if (Object.keys(asked).length > 0) {
    try {
      analysis = analyseTemperatureLog(series, asked);
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
