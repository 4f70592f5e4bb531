// The device cookie of OWASP's "slow down online guessing with device cookies": a signed random
// id a browser gets when someone signs in from it. Which people it signed in as is kept in
// sign_in_devices; the signature keeps a made-up id from being looked up at all.
import { SignJWT, jwtVerify, errors } from 'jose';
import type { Clock } from './clock';

export const deviceCookieName = 'heatpath_device';

const issuer = 'heatpath';
const audience = 'heatpath-device';
const uuidPattern = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

export function createDeviceSigner(secret: string, ttlDays: number, clock: Clock) {
  const key = new TextEncoder().encode(secret);
  const ttlMs = ttlDays * 24 * 3600 * 1000;
  return {
    ttlMs,
    async sign(deviceId: string): Promise<string> {
      const now = clock();
      return new SignJWT({})
        .setProtectedHeader({ alg: 'HS256' })
        .setSubject(deviceId)
        .setIssuer(issuer)
        .setAudience(audience)
        .setIssuedAt(now)
        .setExpirationTime(new Date(now.getTime() + ttlMs))
        .sign(key);
    },
    /** The device id of a valid cookie, or null. */
    async verify(token: string | undefined): Promise<string | null> {
      if (!token) return null;
      try {
        const { payload } = await jwtVerify(token, key, {
          issuer,
          audience,
          algorithms: ['HS256'],
          currentDate: clock(),
        });
        return typeof payload.sub === 'string' && uuidPattern.test(payload.sub)
          ? payload.sub
          : null;
      } catch (error) {
        if (error instanceof errors.JOSEError) return null;
        throw error;
      }
    },
  };
}

export type DeviceSigner = ReturnType<typeof createDeviceSigner>;
