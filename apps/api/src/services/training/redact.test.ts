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
});
