// Notes on the coolant after switch-off. With the engine stopped the coolant stops moving and
// the hot block heats it for a while (heat soak), so it rises briefly: that is not an
// over-temperature episode while running (cooling-diagnosis.md, traps; common practice). The
// analysis leaves those stretches out and says so; without an engine-speed channel it cannot
// tell, and says that when the log ends hot.
import type { EngineRunning } from './engine-running.js';
import { stoppedStretches } from './engine-running.js';
import type { OverTemperatureEpisode } from './over-temperature.js';

// A rise smaller than this after switch-off is within a sensor's noise and not worth a note.
const NOTABLE_RISE_K = 1;

function clock(seconds: number): string {
  const whole = Math.max(0, Math.round(seconds));
  const m = Math.floor(whole / 60);
  const s = whole % 60;
  return `${m}:${String(s).padStart(2, '0')}`;
}

function one(value: number): string {
  return (Math.round(value * 10) / 10).toString();
}

export function heatSoakNotes(options: {
  times: readonly number[];
  coolantC: readonly number[];
  running: EngineRunning;
  episodes: readonly OverTemperatureEpisode[];
  thresholdC: number;
}): string[] {
  const { times, coolantC, running, episodes, thresholdC } = options;
  const t0 = times[0] ?? 0;
  if (!running.known) {
    const lastEpisode = episodes[episodes.length - 1];
    return lastEpisode?.ongoingAtEnd === true
      ? [
          'The log ends over temperature and has no engine-speed channel, so Heatpath cannot tell whether the engine was still running or had been switched off (heat soak after switch-off raises the coolant briefly). Check the last episode against the chart.',
        ]
      : [];
  }
  const notes: string[] = [];
  for (const stretch of stoppedStretches(times, running)) {
    if (stretch.fromIndex === 0) {
      continue; // The engine had not started yet: nothing to soak.
    }
    const atStop = coolantC[stretch.fromIndex - 1] ?? coolantC[stretch.fromIndex] ?? 0;
    let highest = atStop;
    for (let i = stretch.fromIndex; i <= stretch.toIndex; i += 1) {
      highest = Math.max(highest, coolantC[i] ?? highest);
    }
    if (highest - atStop < NOTABLE_RISE_K) {
      continue;
    }
    const over = highest >= thresholdC ? `, above ${one(thresholdC)} °C,` : '';
    notes.push(
      `The engine was switched off at ${clock(stretch.fromSeconds - t0)} into the log; the coolant then rose from ${one(atStop)} °C to ${one(highest)} °C${over} as the hot engine soaked heat into it. Heatpath does not count that as running over temperature, nor as the peak.`,
    );
  }
  return notes;
}
