import { describe, expect, it } from 'vitest';
import type { CaseStatus } from '../db/models/diagnostic-case';
import {
  findingsSavePermission,
  isDiagnosisFinished,
  isOpenToFindingsEditing,
  isOpenToReview,
  isOpenToWalking,
  statusAfterWalking,
} from './case-policy';

const at = (status: CaseStatus) => ({ status });

describe('case policy', () => {
  it.each([
    ['open', true, true, false, false, 'findings.edit', 'in_diagnosis'],
    ['in_diagnosis', true, true, false, false, 'findings.edit', 'in_diagnosis'],
    ['diagnosed', false, false, true, true, 'findings.review', 'diagnosed'],
    ['closed', false, false, false, true, null, 'closed'],
  ] as const)(
    'a case that is %s: walking %s, technician findings %s, review %s, finished %s',
    (status, walking, editing, review, finished, permission, after) => {
      const kase = at(status);
      expect(isOpenToWalking(kase)).toBe(walking);
      expect(isOpenToFindingsEditing(kase)).toBe(editing);
      expect(isOpenToReview(kase)).toBe(review);
      expect(isDiagnosisFinished(kase)).toBe(finished);
      expect(findingsSavePermission(kase)).toBe(permission);
      expect(statusAfterWalking(kase)).toBe(after);
    },
  );
});
