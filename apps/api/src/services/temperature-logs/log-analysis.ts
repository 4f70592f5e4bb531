// The analysis of a case's log with what the case knows of its engine. The vehicle's engine
// description is free text; a switchable coolant pump or a map-controlled thermostat is taken
// only when it is named there outright (engineFactsFromDescription), and is otherwise left
// unknown, so the analysis gives both readings rather than guessing from silence.
import {
  analyseTemperatureLog,
  ANALYSIS_VERSION,
  engineFactsFromDescription,
} from '@heatpath/temperature-log';
import type {
  AnalysableSeries,
  AnalyseTemperatureLogOptions,
  EngineFacts,
  TemperatureLogAnalysis,
} from '@heatpath/temperature-log';
import type { Transaction } from 'sequelize';
import { DiagnosticCase, Vehicle } from '../../db/models/index';
import type { Actor } from '../../policies/permissions';

/** What the case's vehicle says about its engine; {} when the case or its description is silent. */
export async function engineFactsForCase(options: {
  actor: Actor;
  caseId: string;
  transaction?: Transaction;
}): Promise<EngineFacts> {
  const kase = await DiagnosticCase.findOne({
    where: { id: options.caseId, workshopId: options.actor.workshopId },
    attributes: ['id'],
    include: [{ model: Vehicle, as: 'vehicle', attributes: ['id', 'engine'] }],
    transaction: options.transaction,
  });
  return engineFactsFromDescription(kase?.vehicle?.engine ?? null);
}

export function analyseCaseLog(
  series: AnalysableSeries,
  facts: EngineFacts,
  asked: AnalyseTemperatureLogOptions = {},
): TemperatureLogAnalysis {
  return analyseTemperatureLog(series, { ...facts, ...asked });
}

/**
 * Whether a stored analysis was made by today's rules with today's engine facts. Analyses stored
 * before the version field have none; the vehicle's description may have changed since.
 */
export function isCurrentAnalysis(stored: TemperatureLogAnalysis, facts: EngineFacts): boolean {
  const version: unknown = (stored as Partial<TemperatureLogAnalysis>).version;
  const options: Partial<TemperatureLogAnalysis['options']> = stored.options;
  return (
    version === ANALYSIS_VERSION &&
    (options.switchablePump ?? null) === (facts.switchablePump ?? null) &&
    (options.mapControlledThermostat ?? null) === (facts.mapControlledThermostat ?? null)
  );
}
