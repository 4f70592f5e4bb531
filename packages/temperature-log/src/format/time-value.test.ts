// One time value at a time, in each format Heatpath reads.
import { describe, expect, it } from 'vitest';
import { detectTimeFormat, readTime } from './time-value.js';

describe('readTime', () => {
  it.each([
    ['12.5', 'seconds', 12.5],
    ['12,5', 'seconds', 12.5],
    ['1500', 'milliseconds', 1.5],
    ['2,5', 'minutes', 150],
    ['07:05', 'mm:ss', 425],
    ['125:30,5', 'mm:ss', 7530.5],
    ['01:02:03', 'hh:mm:ss', 3723],
    ['1:02:03.25', 'hh:mm:ss', 3723.25],
    ['1970-01-01T00:01:00Z', 'iso', 60],
    ['1970-01-01 00:01:00.5', 'iso', 60.5],
    ['1970-01-01T01:01:00+01:00', 'iso', 60],
    ['1970-01-01T00:00:00-0030', 'iso', 1800],
    ['1970-01-01T00:01', 'iso', 60],
  ] as const)('"%s" as %s is %d s', (text, format, seconds) => {
    expect(readTime(text, format)).toBeCloseTo(seconds, 9);
  });

  it.each([
    ['12:75', 'mm:ss'],
    ['1:2:3', 'hh:mm:ss'],
    ['2024-13-01T00:00:00', 'iso'],
    ['ten', 'seconds'],
    ['', 'seconds'],
  ] as const)('"%s" is not %s', (text, format) => {
    expect(readTime(text, format)).toBeNaN();
  });
});

describe('detectTimeFormat', () => {
  it('takes the shape most values share', () => {
    expect(detectTimeFormat(['00:01', '00:02', 'x'])).toBe('mm:ss');
    expect(detectTimeFormat(['1', '2', '3'], 'milliseconds')).toBe('milliseconds');
    expect(detectTimeFormat(['a', 'b', '1'])).toBeNull();
    expect(detectTimeFormat([])).toBeNull();
  });
});
