// Drafts of typed readings: kept and read back, and never an error when storage is refused or
// holds something that is not a draft.
import { afterEach, describe, expect, it, vi } from 'vitest';
import {
  clearReadingDraft,
  loadReadingDraft,
  readingDraftId,
  saveReadingDraft,
} from './reading-drafts';

const id = readingDraftId('case-1', 'cap-test');

afterEach(() => {
  vi.restoreAllMocks();
  window.localStorage.clear();
});

describe('reading drafts', () => {
  it('keeps a draft per case and step until it is cleared', () => {
    saveReadingDraft(id, { values: { capRating: '1,4' }, units: { capRating: 'psi' } });
    expect(loadReadingDraft(id)).toEqual({
      values: { capRating: '1,4' },
      units: { capRating: 'psi' },
    });
    expect(loadReadingDraft(readingDraftId('case-2', 'cap-test'))).toBeNull();
    expect(loadReadingDraft(readingDraftId('case-1', 'pressure-test'))).toBeNull();
    clearReadingDraft(id);
    expect(loadReadingDraft(id)).toBeNull();
  });

  it('reads no draft from bad JSON, a wrong shape or unknown units', () => {
    window.localStorage.setItem(id, '{not json');
    expect(loadReadingDraft(id)).toBeNull();
    window.localStorage.setItem(id, '"text"');
    expect(loadReadingDraft(id)).toBeNull();
    window.localStorage.setItem(
      id,
      JSON.stringify({ values: { capRating: 14 }, units: { capRating: 'furlong', other: 'psi' } }),
    );
    expect(loadReadingDraft(id)).toEqual({ values: {}, units: { other: 'psi' } });
  });

  it('carries on without storage (private browsing, full storage)', () => {
    vi.spyOn(Storage.prototype, 'setItem').mockImplementation(() => {
      throw new DOMException('Full', 'QuotaExceededError');
    });
    vi.spyOn(Storage.prototype, 'getItem').mockImplementation(() => {
      throw new DOMException('Refused', 'SecurityError');
    });
    vi.spyOn(Storage.prototype, 'removeItem').mockImplementation(() => {
      throw new DOMException('Refused', 'SecurityError');
    });
    expect(() => saveReadingDraft(id, { values: { a: '1' }, units: {} })).not.toThrow();
    expect(loadReadingDraft(id)).toBeNull();
    expect(() => clearReadingDraft(id)).not.toThrow();
  });
});
