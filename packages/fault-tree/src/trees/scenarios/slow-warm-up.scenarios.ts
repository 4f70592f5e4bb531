// Scenario bank for the shipped tree "slow-warm-up-little-heat": each scenario is a car a technician could meet,
// with one true fault (or a healthy part that must not be blamed) and the answers given at each
// step. scenario-bank.test.ts walks every one through the compiled tree.
import { scenarioBank } from './scenario.js';

export const slowWarmUpScenarios = scenarioBank({
  treeId: 'slow-warm-up-little-heat',
  confirmations: {},
  scenarios: [],
});
