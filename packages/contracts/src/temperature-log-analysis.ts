// The temperature-log package's own shapes as the API sends them: the analysis, its candidate
// readings, the detected file format and the columns. Each schema is typed with that package's
// type, so the compiler holds the description and the package together.
import {
  COLUMN_ROLES,
  type CandidateColumn,
  type CandidateReading,
  type DetectedFormat,
  type ResolvedMapping,
  type TemperatureLogAnalysis,
} from '@heatpath/temperature-log';
import { z } from 'zod';

const temperatureUnitSchema = z.enum(['degC', 'degF']);
const speedUnitSchema = z.enum(['km/h', 'mph']);
const timeFormatSchema = z.enum(['seconds', 'milliseconds', 'minutes', 'mm:ss', 'hh:mm:ss', 'iso']);
const columnRoleSchema = z.enum(COLUMN_ROLES);

export const mappingFieldSchema = z.union([columnRoleSchema, z.literal('temperatureUnit')]);

const basisSchema = z.object({ method: z.string(), status: z.string() });
const notFound = { found: z.literal(false), reason: z.string(), basis: basisSchema };
const notFoundSchema = z.object(notFound);
const found = <T extends z.ZodRawShape>(shape: T) =>
  z.object({ found: z.literal(true), ...shape, basis: basisSchema });

const overTemperatureEpisodeSchema = z.object({
  startSeconds: z.number(),
  endSeconds: z.number(),
  durationSeconds: z.number(),
  peakC: z.number(),
  peakAtSeconds: z.number(),
  ongoingAtEnd: z.boolean(),
});

const swingEpisodeSchema = z.object({
  startSeconds: z.number(),
  endSeconds: z.number(),
  cycles: z.number(),
  amplitudeK: z.number(),
  periodSeconds: z.number(),
  meanC: z.number(),
  minC: z.number(),
  maxC: z.number(),
  fanFollows: z.boolean().nullable(),
  suggestion: z.enum(['fan-cycling', 'thermostat-hunting', 'fan-or-thermostat']),
  note: z.string(),
});

const analysisOptionsSchema = z.object({
  overTemperatureC: z.number(),
  minEpisodeSeconds: z.number(),
  episodeHysteresisK: z.number(),
  episodeSmoothingSeconds: z.number(),
  smoothingSeconds: z.number(),
  slopeWindowSeconds: z.number(),
  openingSlopeFraction: z.number(),
  minWarmUpRiseK: z.number(),
  minWarmUpRateKPerMin: z.number(),
  resumeRiseK: z.number(),
  resumeWindowSeconds: z.number(),
  coldStartBelowC: z.number(),
  warmUpTargetC: z.number(),
  minSwingK: z.number(),
  minSwingCycles: z.number(),
  maxSwingPeriodSeconds: z.number(),
  swingSmoothingSeconds: z.number(),
  minSettledSeconds: z.number(),
  settleDelaySeconds: z.number(),
  switchablePump: z.boolean().nullable(),
  mapControlledThermostat: z.boolean().nullable(),
});

export const temperatureLogAnalysisSchema: z.ZodType<TemperatureLogAnalysis> = z.object({
  version: z.number().int(),
  log: z.object({
    readings: z.number().int(),
    durationSeconds: z.number(),
    medianIntervalSeconds: z.number(),
  }),
  peak: z.object({ valueC: z.number(), atSeconds: z.number(), basis: basisSchema }),
  warmUp: z.discriminatedUnion('found', [
    found({
      startSeconds: z.number(),
      openingSeconds: z.number(),
      seconds: z.number(),
      fromC: z.number(),
    }),
    notFoundSchema,
  ]),
  opening: z.discriminatedUnion('found', [
    found({
      temperatureC: z.number(),
      atSeconds: z.number(),
      typicalRangeC: z.object({ min: z.number(), max: z.number() }),
      comparedWithTypical: z.enum(['below', 'within', 'above']),
      shape: z.enum(['sharp', 'gradual']),
      note: z.string().nullable(),
    }),
    notFoundSchema,
  ]),
  riseRate: z.discriminatedUnion('found', [
    found({
      averageKPerMin: z.number(),
      maxKPerMin: z.number(),
      fromSeconds: z.number(),
      toSeconds: z.number(),
    }),
    notFoundSchema,
  ]),
  shroudRelease: z.discriminatedUnion('found', [
    found({
      atSeconds: z.number(),
      temperatureC: z.number(),
      dipK: z.number(),
      resumedAtSeconds: z.number(),
      reading: z.enum(['shroud-release', 'shroud-release-or-early-opening']),
      note: z.string(),
    }),
    notFoundSchema,
  ]),
  timeToTarget: z.discriminatedUnion('found', [
    found({ targetC: z.number(), seconds: z.number() }),
    z.object({ ...notFound, targetC: z.number() }),
  ]),
  settled: z.discriminatedUnion('found', [
    found({ medianC: z.number(), fromSeconds: z.number(), toSeconds: z.number() }),
    notFoundSchema,
  ]),
  overTemperature: z.object({
    thresholdC: z.number(),
    minEpisodeSeconds: z.number(),
    episodes: z.array(overTemperatureEpisodeSchema),
    basis: basisSchema,
  }),
  swings: z.object({ episodes: z.array(swingEpisodeSchema), basis: basisSchema }),
  ambient: z.discriminatedUnion('found', [found({ medianC: z.number() }), notFoundSchema]),
  notes: z.array(z.string()),
  options: analysisOptionsSchema,
});

export const candidateReadingSchema: z.ZodType<CandidateReading> = z.object({
  name: z.enum([
    'thermostatOpeningC',
    'warmUpMinutes',
    'minutesToTargetC',
    'peakCoolantC',
    'settledCoolantC',
    'ambientC',
    'overTemperatureEpisodes',
    'longestOverTemperatureMinutes',
    'swingAmplitudeK',
  ]),
  value: z.number(),
  unit: z.enum(['degC', 'min', 'K', 'none']),
  quantity: z.enum(['temperature', 'time', 'temperatureDelta', 'number']),
  label: z.string(),
  atSeconds: z.number().nullable(),
  matchesInputs: z.array(z.string()),
  basis: basisSchema,
  needsConfirmation: z.literal(true),
});

export const detectedFormatSchema: z.ZodType<DetectedFormat> = z.object({
  encoding: z.enum(['utf-8', 'utf-16le', 'utf-16be', 'windows-1252']).nullable(),
  delimiter: z.enum([',', ';', '\t']),
  decimal: z.enum(['.', ',']).nullable(),
  header: z.boolean(),
  headerLine: z.number().int().nullable(),
  unitLine: z.number().int().nullable(),
  preambleLines: z.number().int(),
  firstDataLine: z.number().int(),
  columnCount: z.number().int(),
  timeFormat: timeFormatSchema.nullable(),
  unit: temperatureUnitSchema.nullable(),
});

const columnIndexSchema = z.number().int().min(0);
const optionalColumnSchema = columnIndexSchema.nullable().optional();

/** A mapping as it may be proposed: every field optional (`Partial<ColumnMapping>`). */
export const proposedMappingSchema = z.object({
  time: columnIndexSchema.optional(),
  coolant: columnIndexSchema.optional(),
  intakeAir: optionalColumnSchema,
  ambient: optionalColumnSchema,
  vehicleSpeed: optionalColumnSchema,
  engineSpeed: optionalColumnSchema,
  fanDuty: optionalColumnSchema,
  temperatureUnit: temperatureUnitSchema.optional(),
  vehicleSpeedUnit: speedUnitSchema.optional(),
  timeUnit: z.enum(['seconds', 'milliseconds', 'minutes']).optional(),
});

export const resolvedMappingSchema: z.ZodType<ResolvedMapping> = proposedMappingSchema.extend({
  time: columnIndexSchema,
  coolant: columnIndexSchema,
  temperatureUnit: temperatureUnitSchema,
  vehicleSpeedUnit: speedUnitSchema,
});

export const candidateColumnSchema: z.ZodType<CandidateColumn> = z.object({
  index: z.number().int(),
  header: z.string().nullable(),
  samples: z.array(z.string()),
  suggestedRole: columnRoleSchema.nullable(),
  looksLike: z.enum(['time', 'number', 'text', 'empty']),
  timeFormat: timeFormatSchema.nullable(),
  inOrder: z.boolean(),
  statedUnit: z.union([temperatureUnitSchema, speedUnitSchema]).nullable(),
});
