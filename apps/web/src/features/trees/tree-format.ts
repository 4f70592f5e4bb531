// Words for the tree screens: version statuses and verdicts, and how dates are shown. No
// fault-tree code, so the library screens load without mathjs; quantities and units are in
// units-format.ts.
import type { RegressionVerdict, TreeVersionInfo, TreeVersionStatus } from '@heatpath/contracts';
import type { BadgeTone } from '../../components/ui/badge';

export const statusWords: Record<TreeVersionStatus, string> = {
  draft: 'Draft',
  published: 'Published',
  retired: 'Retired',
};

export const statusTones: Record<TreeVersionStatus, BadgeTone> = {
  draft: 'caution',
  published: 'ok',
  retired: 'neutral',
};

export const verdictWords: Record<RegressionVerdict, string> = {
  'same-outcome': 'Same finding',
  'different-outcome': 'Different finding',
  'no-outcome': 'Stops before a finding',
  diverged: 'Answers no longer fit',
};

export const verdictIcons: Record<RegressionVerdict, string> = {
  'same-outcome': '✓',
  'different-outcome': '✕',
  'no-outcome': '!',
  diverged: '!',
};

export const verdictTones: Record<RegressionVerdict, BadgeTone> = {
  'same-outcome': 'ok',
  'different-outcome': 'danger',
  'no-outcome': 'caution',
  diverged: 'caution',
};

export function isVerdict(value: string): value is RegressionVerdict {
  return Object.hasOwn(verdictWords, value);
}

const dateFormat = new Intl.DateTimeFormat('en-GB', {
  day: 'numeric',
  month: 'short',
  year: 'numeric',
  hour: '2-digit',
  minute: '2-digit',
});

export function formatWhen(iso: string | null): string {
  if (!iso) return '';
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? '' : dateFormat.format(date);
}

export function versionName(version: Pick<TreeVersionInfo, 'version' | 'status'>): string {
  return version.status === 'draft' ? `Draft v${version.version}` : `v${version.version}`;
}

export function problemCount(count: number): string {
  return count === 1 ? '1 problem' : `${count} problems`;
}
