// What a vehicle's free-text engine description says about the two engine facts the analysis
// uses. Deliberately narrow: a fact is taken only when the description names it outright
// ("switchable coolant pump", "map-controlled thermostat"), as false only when it is named with
// "no"/"without"/"not" in front, and otherwise left unknown. Silence is not a "no": most
// descriptions say only "1.6 petrol", and the analysis then gives both readings.
import type { EngineFacts } from './analysis-options.js';

const NEGATION = String.raw`\b(?:no|not|without|non)[\s-]+(?:an?\s+)?`;
const SWITCHABLE_PUMP = String.raw`switch(?:able|ed)\s+(?:main\s+)?(?:coolant\s+|water\s+)?pump\b`;
const MAP_THERMOSTAT = String.raw`(?:map[\s-]?controlled|electronically[\s-]controlled|electrically\s+heated|heated)\s+thermostat\b`;

function fact(description: string, phrase: string): boolean | undefined {
  if (new RegExp(NEGATION + phrase, 'i').test(description)) {
    return false;
  }
  if (new RegExp(String.raw`\b` + phrase, 'i').test(description)) {
    return true;
  }
  return undefined;
}

export function engineFactsFromDescription(description: string | null | undefined): EngineFacts {
  if (description === null || description === undefined) {
    return {};
  }
  const switchablePump = fact(description, SWITCHABLE_PUMP);
  const mapControlledThermostat = fact(description, MAP_THERMOSTAT);
  return {
    ...(switchablePump === undefined ? {} : { switchablePump }),
    ...(mapControlledThermostat === undefined ? {} : { mapControlledThermostat }),
  };
}
