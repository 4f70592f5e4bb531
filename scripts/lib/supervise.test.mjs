// The restart policy of `npm start`, with a fake server process and a fake clock: crashes are
// restarted after a doubling pause, a healthy run resets it, repeated crashes give up, and a
// stop during a pause cancels the restart.
import { EventEmitter } from 'node:events';
import { describe, expect, it } from 'vitest';
import { supervise } from './supervise.mjs';

function harness(overrides = {}) {
  let clock = 0;
  const timers = [];
  const children = [];
  const events = [];
  const supervisor = supervise({
    start: () => {
      const child = Object.assign(new EventEmitter(), {
        killedWith: null,
        kill(signal) {
          this.killedWith = signal;
          this.emit('exit', null, signal);
        },
      });
      children.push(child);
      return child;
    },
    onCrash: (info) => events.push(['crash', info.attempt, info.delayMs]),
    onRestart: (_child, attempt) => events.push(['restart', attempt]),
    onGiveUp: (info) => events.push(['give-up', info.crashes]),
    onStopped: (code) => events.push(['stopped', code]),
    now: () => clock,
    setTimer: (fn, ms) => {
      const timer = { fn, ms };
      timers.push(timer);
      return timer;
    },
    clearTimer: (timer) => timers.splice(timers.indexOf(timer), 1),
    ...overrides,
  });
  return {
    supervisor,
    children,
    events,
    crash: (code = 1) => children.at(-1).emit('exit', code, null),
    /** Lets the pending pause run out (the clock moves by its length). */
    elapse: () => {
      const timer = timers.shift();
      clock += timer.ms;
      timer.fn();
    },
    advance: (ms) => (clock += ms),
  };
}

describe('the npm start supervisor', () => {
  it('restarts a crashed server after 1 s, 2 s, 4 s … and counts a healthy run as a fresh start', () => {
    const h = harness();
    h.crash();
    h.elapse();
    h.crash();
    h.elapse();
    h.crash();
    h.elapse();
    expect(h.children).toHaveLength(4);
    h.advance(60_000);
    h.crash();
    h.elapse();
    expect(h.events).toEqual([
      ['crash', 1, 1000],
      ['restart', 1],
      ['crash', 2, 2000],
      ['restart', 2],
      ['crash', 3, 4000],
      ['restart', 3],
      ['crash', 1, 1000],
      ['restart', 1],
    ]);
  });

  it('caps the pause at 30 s and gives up after 8 crashes in a row', () => {
    const h = harness();
    for (let i = 0; i < 8; i += 1) {
      h.crash();
      h.elapse();
    }
    h.crash();
    const delays = h.events.filter((e) => e[0] === 'crash').map((e) => e[2]);
    expect(delays).toEqual([1000, 2000, 4000, 8000, 16000, 30000, 30000, 30000]);
    expect(h.events.at(-1)).toEqual(['give-up', 8]);
    expect(h.children).toHaveLength(9);
  });

  it('stops the running server when asked, without restarting it', () => {
    const h = harness();
    h.supervisor.stop('SIGTERM');
    expect(h.children[0].killedWith).toBe('SIGTERM');
    expect(h.events).toEqual([['stopped', null]]);
  });

  it('cancels a restart that is waiting when asked to stop', () => {
    const h = harness();
    h.crash();
    h.supervisor.stop();
    expect(h.children).toHaveLength(1);
    expect(h.events).toEqual([
      ['crash', 1, 1000],
      ['stopped', 0],
    ]);
  });
});
