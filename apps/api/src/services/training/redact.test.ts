// The redacter on its own: known personal values, e-mail addresses and phone numbers go; the
// readings and words a story needs stay. Examples are invented.
import { describe, expect, it } from 'vitest';
import { redacter, secretsOf } from './redact';

const redact = redacter({
  customerName: 'Ann Polglase',
  phone: '01632 960123',
  email: 'ann.p@example.test',
  plate: 'AB12 CDE',
  vin: 'KX1HT84A0JB123457',
});

describe('redacting personal data from free text', () => {
  it('removes the customer, their contacts and the vehicle identifiers', () => {
    expect(redact('Ann Polglase rang from 01632 960123 about AB12 CDE')).toBe(
      '[hidden] rang from [hidden] about [hidden]',
    );
    expect(redact('polglase says ab12cde runs hot; VIN KX1HT84A0JB123457')).toBe(
      '[hidden] says [hidden] runs hot; VIN [hidden]',
    );
    expect(redact('Mail ann.p@example.test or someone@else.test')).toBe(
      'Mail [hidden] or [hidden]',
    );
    expect(redact('Other number: +44 1632 960 555')).toBe('Other number: [hidden]');
  });

  it('keeps readings, figures and words that only contain a name', () => {
    expect(redact('Hoses 110 106 52 °C; cap held 1.38 bar at 15 min')).toBe(
      'Hoses 110 106 52 °C; cap held 1.38 bar at 15 min',
    );
    expect(redact('Announced the annual service')).toBe('Announced the annual service');
  });

  it('takes the whole name before its parts, and skips parts under three letters', () => {
    expect(secretsOf({ customerName: 'Jo Penhallow' })).toEqual(['Jo Penhallow', 'Penhallow']);
  });

  it('finds a plate or VIN however it is spaced or dashed, as the vehicle search does', () => {
    const car = redacter({ plate: 'UX64 SEE', vin: 'WVWZZZ1JZ3W386752' });
    expect(car('Plate UX64-SEE, also ux64see and U X 6 4 S E E.')).toBe(
      'Plate [hidden], also [hidden] and [hidden].',
    );
    expect(car('VIN WVW ZZZ 1JZ 3W3 867 52 / WVW-ZZZ1JZ3W-386752 checked')).toBe(
      'VIN [hidden] / [hidden] checked',
    );
    const spaced = redacter({ plate: 'QF19 6PF' });
    expect(spaced('Q F 1 9 6 P F in bay 2; QF19 6 PF out')).toBe('[hidden] in bay 2; [hidden] out');
  });

  it('takes the plate’s parts and the VIN’s serial, but leaves words that match a part', () => {
    const car = redacter({ plate: 'UX64 SEE', vin: 'WVWZZZ1JZ3W386752' });
    expect(car('Booked as UX64, the SEE one; serial 386752')).toBe(
      'Booked as [hidden], the [hidden] one; serial [hidden]',
    );
    expect(car('Could see steam at the cap, 64 °C, seen twice')).toBe(
      'Could see steam at the cap, 64 °C, seen twice',
    );
    expect(car('Part UX640 and 3867521 are other numbers')).toBe(
      'Part UX640 and 3867521 are other numbers',
    );
  });
});
