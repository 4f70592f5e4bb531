// Shapes the trees API returns that the contracts package declares as TypeScript interfaces only
// (the definition and its problems belong to the fault-tree package). The web app must not
// re-type them, so these check only what the screens cannot work without and otherwise trust the
// interface; a broken answer still becomes the client's "not understood" error.
import type {
  RegressionReport,
  TreeLibraryEntry,
  TreeVersionDetail,
  TreeVersionInfo,
} from '@heatpath/contracts';
import type { TreeDiff } from '@heatpath/fault-tree';
import { z } from 'zod';

function hasFields(value: unknown, fields: readonly string[]): boolean {
  return (
    typeof value === 'object' &&
    value !== null &&
    fields.every((field) => Object.hasOwn(value, field))
  );
}

function hasList(value: unknown, field: string): boolean {
  return hasFields(value, [field]) && Array.isArray((value as Record<string, unknown>)[field]);
}

export const treeLibrarySchema = z.custom<{ trees: TreeLibraryEntry[] }>((value) =>
  hasList(value, 'trees'),
);

export const treeEntrySchema = z.custom<TreeLibraryEntry & { regressionCaseIds: string[] }>(
  (value) => hasFields(value, ['id', 'title', 'symptom']) && hasList(value, 'versions'),
);

export const treeVersionDetailSchema = z.custom<TreeVersionDetail>(
  (value) =>
    hasFields(value, ['id', 'version', 'revision', 'definition']) && hasList(value, 'problems'),
);

export const treeVersionInfoSchema = z.custom<TreeVersionInfo>((value) =>
  hasFields(value, ['id', 'version', 'status']),
);

export const createdTreeSchema = z.custom<{ treeId: string; draft: TreeVersionDetail }>((value) =>
  hasFields(value, ['treeId', 'draft']),
);

export interface TreeDiffResponse {
  from: { id: string; version: number; status: string };
  to: { id: string; version: number; status: string };
  diff: TreeDiff;
}

export const treeDiffSchema = z.custom<TreeDiffResponse>(
  (value) =>
    hasFields(value, ['from', 'to', 'diff']) &&
    hasList((value as { diff: unknown }).diff, 'changed'),
);

export const regressionReportSchema = z.custom<RegressionReport>(
  (value) => hasList(value, 'results') && hasFields(value, ['summary']),
);

export const regressionSetSchema = z.custom<{ caseIds: string[] }>((value) =>
  hasList(value, 'caseIds'),
);
