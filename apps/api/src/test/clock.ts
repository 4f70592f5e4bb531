// A clock for tests that moves only when told, so expiry and sign-in pauses are tested without
// waiting.
import type { Clock } from '../lib/clock';

export interface TestClock extends Clock {
  advance(ms: number): void;
}

export function testClock(start: Date = new Date()): TestClock {
  let now = start.getTime();
  const clock = () => new Date(now);
  return Object.assign(clock, {
    advance(ms: number) {
      now += ms;
    },
  });
}
