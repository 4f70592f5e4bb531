// The words for a step, the same on the case page, in the tree editor and its Try it, and in
// training: its kind ("Measurement"), and each hazard named in a few words, leading its caution.
import type { HazardKind, NodeKind } from '@heatpath/fault-tree';

export const stepKindLabels: Record<NodeKind, string> = {
  question: 'Question',
  measurement: 'Measurement',
  procedure: 'Procedure',
  outcome: 'Finding',
};

export const hazardLabels: Record<HazardKind, string> = {
  'hot-pressurised-coolant': 'Hot coolant under pressure',
  'hot-surface': 'Hot surfaces',
  fan: 'Fan and belt can start',
  glycol: 'Coolant is poisonous',
  lifting: 'Raised vehicle',
  'belt-drive': 'Timing-belt work',
  'road-test': 'Road test',
};
