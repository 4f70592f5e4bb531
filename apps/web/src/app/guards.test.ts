import { describe, expect, it } from 'vitest';
import { safeNextPath, signInPath } from './guards';

describe('sign-in redirects', () => {
  it('remembers the wanted screen', () => {
    expect(signInPath('/staff')).toBe('/sign-in?next=%2Fstaff');
    expect(signInPath('/')).toBe('/sign-in');
  });

  it('only follows paths inside the app after signing in', () => {
    expect(safeNextPath('/staff')).toBe('/staff');
    expect(safeNextPath('//evil.test/x')).toBe('/');
    expect(safeNextPath('https://evil.test')).toBe('/');
    expect(safeNextPath('/sign-in')).toBe('/');
    expect(safeNextPath(null)).toBe('/');
  });
});
