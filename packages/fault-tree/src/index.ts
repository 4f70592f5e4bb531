// Public API of @heatpath/fault-tree: Heatpath's decision-tree format (schema and types),
// validation, formula checking, compiling a tree to an XState machine, walking and replaying
// walks (a walk is stored as its events and replayed). No I/O; the shipped trees are at "@heatpath/fault-tree/trees".

// Format
export {
  branchSchema,
  cautionSchema,
  choiceSchema,
  computedValueSchema,
  evidenceRequestSchema,
  fallbackSchema,
  FORMULA_MAX_LENGTH,
  hazardKinds,
  labourLineSchema,
  measurementInputSchema,
  measurementNodeSchema,
  nodeKinds,
  outcomeNodeSchema,
  partLineSchema,
  procedureNodeSchema,
  questionNodeSchema,
  TREE_FORMAT,
  TREE_FORMAT_VERSION,
  treeDefinitionSchema,
  treeNodeSchema,
} from './schema/tree-schema.js';
export type {
  Branch,
  Caution,
  Choice,
  ComputedValue,
  EvidenceRequest,
  Fallback,
  HazardKind,
  LabourLine,
  MeasurementInput,
  MeasurementNode,
  NodeKind,
  OutcomeNode,
  PartLine,
  ProcedureNode,
  QuestionNode,
  StepNode,
  TreeDefinition,
  TreeDefinitionInput,
  TreeNode,
  ValueRange,
} from './schema/tree-schema.js';
export { NODE_ID_PATTERN, VALUE_NAME_PATTERN } from './schema/identifiers.js';

// Units
export {
  quantities,
  quantityInfo,
  unitCodes,
  unitSymbol,
  canonicalUnitOf,
  acceptsUnit,
} from './units/quantities.js';
export type { Quantity, QuantityInfo, TreeQuantity, UnitCode } from './units/quantities.js';
export { fromCanonical, toCanonical } from './units/convert-units.js';
export {
  formatCanonical,
  formatComputed,
  formatNumber,
  formatRange,
  formatWithUnit,
} from './units/format-value.js';

// Validation
export { validateTree } from './validation/validate-tree.js';
export { problemCodes } from './validation/problem.js';
export type { DefinitionPath, ProblemCode, TreeProblem } from './validation/problem.js';
export { listEdges } from './validation/tree-graph.js';
export type { EdgeKind, TreeEdge } from './validation/tree-graph.js';

// Formulas
export { checkFormula, formulaNamesOf, listFormulaFunctions } from './formula/check-formula.js';
export type {
  FormulaCheck,
  FormulaCheckOptions,
  FormulaFunctionHelp,
} from './formula/check-formula.js';
export type { FormulaProblem, FormulaProblemCode } from './formula/analyse-formula.js';
export type { EvaluationResult, FormulaScope, FormulaValue } from './formula/formula-value.js';

// Compile and walk
export { compileTree } from './compile/compile-tree.js';
export type { CompiledTree, CompileResult } from './compile/compile-tree.js';
export { contentFingerprintOf, fingerprintOf } from './compile/fingerprint.js';
export { OUTCOME_TAG } from './walk/walk-machine.js';
export type { WalkMachine } from './walk/walk-machine.js';
export {
  backEventSchema,
  choiceAnswerSchema,
  measurementAnswerSchema,
  procedureAnswerSchema,
  procedureResults,
  readingSchema,
  walkEventSchema,
} from './walk/walk-events.js';
export type {
  AnswerEvent,
  BackEvent,
  ChoiceAnswer,
  MeasurementAnswer,
  ProcedureAnswer,
  ProcedureResult,
  Reading,
  WalkEvent,
  WalkEventType,
} from './walk/walk-events.js';
export type { PathStep, RouteKey, WalkContext } from './walk/walk-context.js';
export { rejectionCodes } from './walk/rejection.js';
export type { AnswerRejection, RejectionCode } from './walk/rejection.js';
export {
  applyWalkEvent,
  checkAnswer,
  previewReadings,
  startWalk,
  WalkInvariantError,
} from './walk/walk-api.js';
export type { AnswerCheck, ApplyResult, ReadingsPreview } from './walk/walk-api.js';
export { computedViews, currentNodeIdOf, describeWalk } from './walk/walk-view.js';
export type {
  AnswerSummary,
  ComputedView,
  NodeView,
  OutcomeView,
  PathEntryView,
  ReadingView,
  WalkSnapshot,
  WalkView,
} from './walk/walk-view.js';
export { replayWalk, summariseWalk } from './walk/replay-walk.js';
export type { Divergence, ReplayResult, WalkSummary } from './walk/replay-walk.js';

// Diff between versions
export { diffTrees } from './diff/diff-trees.js';
export type { FieldChange, NodeChange, NodeRef, TreeDiff } from './diff/diff-trees.js';

// Training: what an apprentice predicts at each step of a finished walk
export {
  maxScoreOf,
  planPredictions,
  predictionPoints,
  predictionQuestions,
  scorePrediction,
} from './training/plan-predictions.js';
export type {
  PlannedPrediction,
  PredictionKind,
  PredictionOption,
} from './training/plan-predictions.js';
