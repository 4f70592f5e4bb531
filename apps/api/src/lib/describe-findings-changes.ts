// "Who changed what": one revision against the one before it, in words a person reads in a
// history list ("Part added: Coolant, 50 % pre-mix × 6", "Correction edited").
import type { FindingsLines } from '@heatpath/contracts';

export interface FindingsContent extends FindingsLines {
  outcomeNodeId: string;
  concern: string;
  cause: string;
  correction: string;
  photoIds: string[];
}

type Part = FindingsLines['parts'][number];
type Labour = FindingsLines['labour'][number];

const quote = (text: string) => (text.length > 60 ? `${text.slice(0, 57)}…` : text);
const partText = (p: Part) =>
  `${quote(p.description)} × ${p.quantity}${p.partNumber ? ` (${p.partNumber})` : ''}`;
const labourText = (l: Labour) => `${quote(l.operation)}, ${l.hours} h`;

function lineChanges<T>(
  what: string,
  before: readonly T[],
  after: readonly T[],
  key: (line: T) => string,
  text: (line: T) => string,
): string[] {
  const changes: string[] = [];
  const beforeKeys = before.map(key);
  const afterKeys = after.map(key);
  after.forEach((line, index) => {
    const at = beforeKeys.indexOf(key(line));
    if (at === -1) {
      // A line whose description changed in place reads as changed, not removed and added.
      const old = before[index];
      if (old !== undefined && !afterKeys.includes(key(old)))
        changes.push(`${what} changed: ${text(old)} → ${text(line)}`);
      else changes.push(`${what} added: ${text(line)}`);
    } else if (text(before[at] as T) !== text(line)) {
      changes.push(`${what} changed: ${text(before[at] as T)} → ${text(line)}`);
    }
  });
  before.forEach((line, index) => {
    if (afterKeys.includes(key(line))) return;
    const replaced = after[index];
    if (replaced !== undefined && !beforeKeys.includes(key(replaced))) return;
    changes.push(`${what} removed: ${text(line)}`);
  });
  return changes;
}

export function describeFindingsChanges(
  before: FindingsContent | null,
  after: FindingsContent,
): string[] {
  if (!before) return ['Drafted from the finding the walk reached'];
  if (before.outcomeNodeId !== after.outcomeNodeId)
    return ['Drafted again: the walk reached a different finding'];
  const changes: string[] = [];
  if (before.concern !== after.concern) changes.push('Concern edited');
  if (before.cause !== after.cause) changes.push('Cause edited');
  if (before.correction !== after.correction) changes.push('Correction edited');
  changes.push(
    ...lineChanges('Part', before.parts, after.parts, (p) => p.description, partText),
    ...lineChanges('Labour', before.labour, after.labour, (l) => l.operation, labourText),
  );
  const addedFollowUps = after.followUps.filter((f) => !before.followUps.includes(f)).length;
  const removedFollowUps = before.followUps.filter((f) => !after.followUps.includes(f)).length;
  if (addedFollowUps || removedFollowUps)
    changes.push(
      addedFollowUps && removedFollowUps
        ? 'Follow-ups edited'
        : addedFollowUps
          ? `Follow-up${addedFollowUps > 1 ? 's' : ''} added`
          : `Follow-up${removedFollowUps > 1 ? 's' : ''} removed`,
    );
  if (JSON.stringify(before.readings) !== JSON.stringify(after.readings))
    changes.push('Readings updated from the walk');
  if (before.photoIds.join() !== after.photoIds.join()) {
    const count = after.photoIds.length;
    changes.push(count === 0 ? 'No photos chosen' : `Photos chosen: ${count} for the repair order`);
  }
  return changes.length > 0 ? changes : ['Saved without changes'];
}
