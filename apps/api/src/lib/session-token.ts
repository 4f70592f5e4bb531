// Signed, expiring session tokens (HS256 via jose) carried in an httpOnly cookie. The token
// names a session row (`sid`); the signature only spares the database forged cookies; whether
// the session still counts is the row's to say (services/auth/find-session-user.ts).
import { SignJWT, jwtVerify, errors } from 'jose';
import type { Clock } from './clock';

export const sessionCookieName = 'heatpath_session';

export interface SessionClaims {
  userId: string;
  workshopId: string;
  sessionId: string;
}

const issuer = 'heatpath';
const audience = 'heatpath-web';

export function createSessionSigner(secret: string, ttlHours: number, clock: Clock) {
  const key = new TextEncoder().encode(secret);
  const ttlMs = ttlHours * 3600 * 1000;
  return {
    ttlMs,
    async sign(claims: SessionClaims, expiresAt: Date): Promise<string> {
      return new SignJWT({ wid: claims.workshopId, sid: claims.sessionId })
        .setProtectedHeader({ alg: 'HS256' })
        .setSubject(claims.userId)
        .setIssuer(issuer)
        .setAudience(audience)
        .setIssuedAt(clock())
        .setExpirationTime(expiresAt)
        .sign(key);
    },
    /** The claims of a valid token, or null for a missing, forged or expired one. */
    async verify(token: string | undefined): Promise<SessionClaims | null> {
      if (!token) return null;
      try {
        const { payload } = await jwtVerify(token, key, {
          issuer,
          audience,
          algorithms: ['HS256'],
          currentDate: clock(),
        });
        const { sub, wid, sid } = payload;
        if (typeof sub !== 'string' || typeof wid !== 'string' || typeof sid !== 'string')
          return null;
        return { userId: sub, workshopId: wid, sessionId: sid };
      } catch (error) {
        if (error instanceof errors.JOSEError) return null;
        throw error;
      }
    },
  };
}

export type SessionSigner = ReturnType<typeof createSessionSigner>;
