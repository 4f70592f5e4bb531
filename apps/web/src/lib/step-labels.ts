// Each hazard named in a few words, leading its caution: on the case page, in the tree editor
// and its Try it, and in training.
import type { HazardKind } from '@heatpath/fault-tree';

export const hazardLabels: Record<HazardKind, string> = {
  'hot-pressurised-coolant': 'Hot coolant under pressure',
  'hot-surface': 'Hot surfaces',
  fan: 'Fan and belt can start',
  glycol: 'Coolant is poisonous',
  lifting: 'Raised vehicle',
  'belt-drive': 'Timing-belt work',
  'road-test': 'Road test',
};
