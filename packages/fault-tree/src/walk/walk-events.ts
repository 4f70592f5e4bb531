// The events a walk is made of. Each names the node it answers, so an answer meant for another
// step (a stale screen, a duplicate submit) is refused instead of being applied to the wrong one;
// `position`, when given, must equal the number of events already in the walk's history, which
// also catches a stale answer to a step the walk has returned to. A stored list of these events
// is the walk: replaying it rebuilds the state exactly.
import { z } from 'zod';
import { choiceIdSchema } from '../schema/identifiers.js';
import { unitCodeSchema } from '../schema/tree-schema.js';

const nodeIdField = z.string().min(1).max(80);
const positionField = z.number().int().min(0).optional();

export const readingSchema = z.strictObject({
  value: z.number(),
  unit: unitCodeSchema,
});
export type Reading = z.infer<typeof readingSchema>;

export const choiceAnswerSchema = z.strictObject({
  type: z.literal('answer.choice'),
  nodeId: nodeIdField,
  position: positionField,
  choiceId: choiceIdSchema,
});

export const measurementAnswerSchema = z.strictObject({
  type: z.literal('answer.measurement'),
  nodeId: nodeIdField,
  position: positionField,
  /** As entered: value and unit per input name; converted to canonical units by the walk. */
  readings: z.record(z.string(), readingSchema),
});

export const procedureResults = ['done', 'could-not-do'] as const;
export const procedureAnswerSchema = z.strictObject({
  type: z.literal('answer.procedure'),
  nodeId: nodeIdField,
  position: positionField,
  result: z.enum(procedureResults),
});

export const backEventSchema = z.strictObject({
  type: z.literal('walk.back'),
  /** The node being left, i.e. the current node when the person pressed back. */
  nodeId: nodeIdField,
  position: positionField,
});

export const walkEventSchema = z.discriminatedUnion('type', [
  choiceAnswerSchema,
  measurementAnswerSchema,
  procedureAnswerSchema,
  backEventSchema,
]);

export type ChoiceAnswer = z.infer<typeof choiceAnswerSchema>;
export type MeasurementAnswer = z.infer<typeof measurementAnswerSchema>;
export type ProcedureAnswer = z.infer<typeof procedureAnswerSchema>;
export type ProcedureResult = (typeof procedureResults)[number];
export type BackEvent = z.infer<typeof backEventSchema>;
export type AnswerEvent = ChoiceAnswer | MeasurementAnswer | ProcedureAnswer;
export type WalkEvent = z.infer<typeof walkEventSchema>;
export type WalkEventType = WalkEvent['type'];
