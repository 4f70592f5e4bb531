// Small formats of the repair-order screens: times, the car, and a send's status in words with
// a mark, so the state never rests on colour alone.
import { outboxStatusLabels, type OutboxStatus } from '@heatpath/contracts';
import type { BadgeTone } from '../../components/ui/badge';

const dateTime = new Intl.DateTimeFormat(undefined, {
  day: 'numeric',
  month: 'short',
  hour: '2-digit',
  minute: '2-digit',
});

export function formatDateTime(iso: string | null): string {
  if (!iso) return '—';
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : dateTime.format(date);
}

export function carName(vehicle: { make: string; model: string; year: number | null }): string {
  return `${vehicle.make} ${vehicle.model}${vehicle.year ? `, ${vehicle.year}` : ''}`;
}

export const sendStatusTones: Record<OutboxStatus, BadgeTone> = {
  queued: 'caution',
  sending: 'neutral',
  sent: 'ok',
  failed: 'danger',
};

export const sendStatusMarks: Record<OutboxStatus, string> = {
  queued: '…',
  sending: '→',
  sent: '✓',
  failed: '✕',
};

export const sendStatusLabel = (status: OutboxStatus) => outboxStatusLabels[status];

/** "12 KB" or "1.4 MB". */
export function formatBytes(bytes: number): string {
  return bytes < 1024 * 1024
    ? `${Math.max(1, Math.round(bytes / 1024))} KB`
    : `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}
