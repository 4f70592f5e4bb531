// Shapes the temperature-log API returns, which the contracts package declares as TypeScript
// interfaces (the analysis and series belong to the temperature-log package and are typed, not
// re-described). These check only what the screens cannot work without.
import type {
  LogUploadResult,
  TemperatureLogDetail,
  TemperatureLogList,
} from '@heatpath/contracts';
import { z } from 'zod';

function hasFields(value: unknown, fields: readonly string[]): boolean {
  return (
    typeof value === 'object' &&
    value !== null &&
    fields.every((field) => Object.hasOwn(value, field))
  );
}

function isLogDetail(value: unknown): boolean {
  return (
    hasFields(value, ['id', 'analysis', 'candidateReadings', 'series']) &&
    hasFields((value as { series: unknown }).series, ['times', 'coolantC'])
  );
}

export const logListSchema = z.custom<TemperatureLogList>(
  (value) => hasFields(value, ['logs']) && Array.isArray((value as { logs: unknown }).logs),
);

export const logDetailSchema = z.custom<TemperatureLogDetail>(isLogDetail);

export const logUploadResultSchema = z.custom<LogUploadResult>((value) => {
  if (!hasFields(value, ['status'])) return false;
  const result = value as { status: unknown; log?: unknown };
  if (result.status === 'stored') return isLogDetail(result.log);
  return result.status === 'needs-mapping' && hasFields(value, ['pendingUploadId', 'columns']);
});
