// The engine facts read from a vehicle's free-text engine description: taken only when named
// outright, "no" only when named with a negation, otherwise unknown (the analysis then gives both
// readings). Descriptions are invented.
import { describe, expect, it } from 'vitest';
import { engineFactsFromDescription } from './engine-facts.js';

describe('engine facts from the engine description', () => {
  it.each([
    ['1.4 turbo petrol, switchable coolant pump', { switchablePump: true }],
    ['2.0 TDI, Switchable water pump', { switchablePump: true }],
    ['1.5 petrol with map-controlled thermostat', { mapControlledThermostat: true }],
    ['2.0 petrol, electrically heated thermostat', { mapControlledThermostat: true }],
    [
      '1.8 petrol, switchable coolant pump and map controlled thermostat',
      { switchablePump: true, mapControlledThermostat: true },
    ],
    ['1.6 petrol, no switchable pump', { switchablePump: false }],
    ['1.6 diesel without a map-controlled thermostat', { mapControlledThermostat: false }],
  ])('reads “%s”', (description, facts) => {
    expect(engineFactsFromDescription(description)).toEqual(facts);
  });

  it.each([['1.6 petrol'], ['2.0 diesel with charge-air cooler loop'], [''], [null], [undefined]])(
    'leaves both unknown for %j',
    (description) => {
      expect(engineFactsFromDescription(description)).toEqual({});
    },
  );
});
