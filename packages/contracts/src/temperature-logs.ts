// Temperature logs on a case as the API takes and returns them: the upload's optional column
// mapping, the "needs mapping" answer with the file's candidate columns, a stored log with its
// analysis and candidate readings, and the series the chart draws. The analysis, the readings and
// the columns belong to the temperature-log package: temperature-log-analysis.ts describes them
// for parsing, typed with that package's own types.
import { z } from 'zod';
import type { ColumnMapping } from '@heatpath/temperature-log';
import { personRefSchema, timestampSchema } from './person';
import {
  candidateColumnSchema,
  candidateReadingSchema,
  detectedFormatSchema,
  mappingFieldSchema,
  proposedMappingSchema,
  resolvedMappingSchema,
  temperatureLogAnalysisSchema,
} from './temperature-log-analysis';

// The package's own shapes the web app reads, passed through so it needs no second dependency.
export type {
  CandidateColumn,
  CandidateReading,
  ColumnMapping,
  ColumnRole,
  MappingField,
  OverTemperatureEpisode,
  ResultBasis,
  SwingEpisode,
  TemperatureLogAnalysis,
} from '@heatpath/temperature-log';

/** Largest log file accepted, in bytes (a 100,000-reading export is about 2–4 MB). */
export const temperatureLogMaxBytes = 20 * 1024 * 1024;
/** Most points the chart series holds; longer windows are thinned keeping each bucket's extremes. */
export const chartMaxPoints = 2000;

const columnIndex = z
  .number({ error: 'Choose a column.' })
  .int('A column is chosen by its position, a whole number.')
  .min(0, 'A column is chosen by its position, from 0.')
  .max(999);
const optionalColumn = columnIndex.nullable().optional();

export const temperatureUnits = ['degC', 'degF'] as const;

/** The short form's answer: which column holds what, and the units when the header is silent. */
export const columnMappingSchema = z
  .object({
    time: columnIndex,
    coolant: columnIndex,
    intakeAir: optionalColumn,
    ambient: optionalColumn,
    vehicleSpeed: optionalColumn,
    engineSpeed: optionalColumn,
    fanDuty: optionalColumn,
    temperatureUnit: z.enum(temperatureUnits, { error: 'Say whether it is °C or °F.' }).optional(),
    vehicleSpeedUnit: z.enum(['km/h', 'mph']).optional(),
    timeUnit: z.enum(['seconds', 'milliseconds', 'minutes']).optional(),
  })
  .strict() satisfies z.ZodType<ColumnMapping>;

/** POST /api/cases/:caseId/logs/:pendingUploadId/mapping and PUT /api/cases/:caseId/logs/:logId/mapping */
export const logMappingRequestSchema = z.object({ mapping: columnMappingSchema });
export type LogMappingRequest = z.infer<typeof logMappingRequestSchema>;

/** The multipart fields beside "file" on POST /api/cases/:caseId/logs. */
export const logUploadFieldsSchema = z.object({
  nodeId: z.string().trim().min(1).max(80).optional(),
  /** A mapping chosen before uploading, as JSON text (multipart fields are text). */
  mapping: z
    .string()
    .max(2000, 'The mapping is too long.')
    .transform((text, ctx) => {
      try {
        return JSON.parse(text) as unknown;
      } catch {
        ctx.addIssue({ code: 'custom', message: 'The mapping is not valid JSON.' });
        return z.NEVER;
      }
    })
    .pipe(columnMappingSchema)
    .optional(),
});

/** GET /api/cases/:caseId/logs/:logId — analysis settings and the chart's time window. */
export const logDetailQuerySchema = z
  .object({
    /** Over-temperature threshold, °C; the episodes are found again with it. */
    threshold: z.coerce
      .number({ error: 'The threshold is a temperature in °C.' })
      .min(60, 'An over-temperature threshold below 60 °C is not a useful one.')
      .max(150, 'Heatpath reads coolant temperatures up to 150 °C.')
      .optional(),
    /** Shortest time above the threshold that counts, s. */
    minEpisodeSeconds: z.coerce.number().int().min(1).max(3600).optional(),
    /** The chart window, seconds from the first reading. */
    from: z.coerce.number().min(0).optional(),
    to: z.coerce.number().min(0).optional(),
    maxPoints: z.coerce.number().int().min(50).max(chartMaxPoints).optional(),
  })
  .refine((q) => q.from === undefined || q.to === undefined || q.to > q.from, {
    message: 'The end of the window must come after its start.',
    path: ['to'],
  });
export type LogDetailQuery = z.infer<typeof logDetailQuerySchema>;

export const logChannels = [
  'intakeAirC',
  'ambientC',
  'vehicleSpeedKph',
  'engineSpeedRpm',
  'fanDuty',
] as const;
export type LogChannel = (typeof logChannels)[number];
export const mappingSources = ['detected', 'confirmed', 'remembered'] as const;
export type MappingSource = (typeof mappingSources)[number];

const optionalChannel = z.array(z.number().nullable()).nullable();

/** The readings the chart draws: all of them, or at most `maxPoints` keeping each bucket's extremes. */
export const chartSeriesSchema = z.object({
  from: z.number(),
  to: z.number(),
  /** Readings of the log inside the window. */
  readingsInWindow: z.number().int(),
  /** True when the window held more readings than `maxPoints` and was thinned. */
  downsampled: z.boolean(),
  maxPoints: z.number().int(),
  times: z.array(z.number()),
  coolantC: z.array(z.number()),
  intakeAirC: optionalChannel,
  ambientC: optionalChannel,
  vehicleSpeedKph: optionalChannel,
  engineSpeedRpm: optionalChannel,
  fanDuty: optionalChannel,
});
export type ChartSeries = z.infer<typeof chartSeriesSchema>;

export const temperatureLogSummarySchema = z.object({
  id: z.uuid(),
  caseId: z.uuid(),
  /** The step the log was attached to; null for the case as a whole. */
  nodeId: z.string().nullable(),
  name: z.string(),
  byteSize: z.number().int(),
  attachmentId: z.uuid(),
  /** The original file, as uploaded. */
  fileUrl: z.string(),
  readings: z.number().int(),
  skippedRows: z.number().int(),
  durationSeconds: z.number(),
  /** The first reading's clock time or timestamp as written in the file. */
  startedAt: z.string().nullable(),
  channels: z.array(z.enum(logChannels)),
  sourceSignature: z.string(),
  mapping: resolvedMappingSchema,
  mappingSource: z.enum(mappingSources),
  detected: detectedFormatSchema,
  /** At the default settings, for the list. */
  headline: z.object({
    peakC: z.number(),
    episodes: z.number().int(),
    openingC: z.number().nullable(),
  }),
  uploadedBy: personRefSchema,
  createdAt: timestampSchema,
});
export type TemperatureLogSummary = z.infer<typeof temperatureLogSummarySchema>;

/** GET /api/cases/:caseId/logs/:logId and PUT …/logs/:logId/mapping */
export const temperatureLogDetailSchema = temperatureLogSummarySchema.extend({
  analysis: temperatureLogAnalysisSchema,
  candidateReadings: z.array(candidateReadingSchema),
  series: chartSeriesSchema,
  /** The file's columns, so the mapping can be changed; null when the file mapped itself. */
  columns: z.array(candidateColumnSchema).nullable(),
});
export type TemperatureLogDetail = z.infer<typeof temperatureLogDetailSchema>;

/** GET /api/cases/:caseId/logs */
export const temperatureLogListSchema = z.object({ logs: z.array(temperatureLogSummarySchema) });
export type TemperatureLogList = z.infer<typeof temperatureLogListSchema>;

/** A file that needs its columns confirmed: the form's content, and the upload to finish. */
export const logNeedsMappingSchema = z.object({
  status: z.literal('needs-mapping'),
  pendingUploadId: z.uuid(),
  name: z.string(),
  sourceSignature: z.string(),
  detected: detectedFormatSchema,
  columns: z.array(candidateColumnSchema),
  proposed: proposedMappingSchema,
  unsure: z.array(mappingFieldSchema),
  reasons: z.array(z.string()),
  /** Set when the workshop's remembered mapping for this source no longer fits the file. */
  rememberedProblem: z.string().nullable(),
});
export type LogNeedsMapping = z.infer<typeof logNeedsMappingSchema>;

export const logStoredSchema = z.object({
  status: z.literal('stored'),
  log: temperatureLogDetailSchema,
});
export type LogStored = z.infer<typeof logStoredSchema>;

/** POST /api/cases/:caseId/logs and POST …/logs/:pendingUploadId/mapping */
export const logUploadResultSchema = z.discriminatedUnion('status', [
  logStoredSchema,
  logNeedsMappingSchema,
]);
export type LogUploadResult = z.infer<typeof logUploadResultSchema>;
