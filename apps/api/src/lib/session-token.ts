// Signed, expiring session tokens (HS256 via jose) carried in an httpOnly cookie.
import { SignJWT, jwtVerify, errors } from 'jose';

export const sessionCookieName = 'heatpath_session';

export interface SessionClaims {
  userId: string;
  workshopId: string;
}

const issuer = 'heatpath';
const audience = 'heatpath-web';

export function createSessionSigner(secret: string, ttlHours: number) {
  const key = new TextEncoder().encode(secret);
  return {
    ttlMs: ttlHours * 3600 * 1000,
    async sign(claims: SessionClaims): Promise<string> {
      return new SignJWT({ wid: claims.workshopId })
        .setProtectedHeader({ alg: 'HS256' })
        .setSubject(claims.userId)
        .setIssuer(issuer)
        .setAudience(audience)
        .setIssuedAt()
        .setExpirationTime(`${Math.round(ttlHours * 3600)}s`)
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
        });
        if (typeof payload.sub !== 'string' || typeof payload.wid !== 'string') return null;
        return { userId: payload.sub, workshopId: payload.wid };
      } catch (error) {
        if (error instanceof errors.JOSEError) return null;
        throw error;
      }
    },
  };
}

export type SessionSigner = ReturnType<typeof createSessionSigner>;
