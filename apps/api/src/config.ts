// Heatpath's settings, read from the environment and validated once. Every setting has a safe
// local default except the session secret outside development and test.
import { z } from 'zod';

const bool = z
  .enum(['true', 'false', '1', '0', 'yes', 'no'])
  .transform((v) => v === 'true' || v === '1' || v === 'yes');

const envSchema = z
  .object({
    NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
    HOST: z.string().default('127.0.0.1'),
    PORT: z.coerce.number().int().min(1).max(65535).default(3000),
    DATABASE_URL: z.string().optional(),
    PGHOST: z.string().default('127.0.0.1'),
    PGPORT: z.coerce.number().int().min(1).max(65535).default(54329),
    PGUSER: z.string().default('postgres'),
    PGPASSWORD: z.string().default(''),
    PGDATABASE: z.string().default('heatpath'),
    DB_POOL_MAX: z.coerce.number().int().min(1).max(200).default(10),
    SESSION_SECRET: z.string().optional(),
    SESSION_TTL_HOURS: z.coerce
      .number()
      .positive()
      .max(24 * 30)
      .default(12),
    COOKIE_SECURE: bool.default(false),
    TRUST_PROXY: bool.default(false),
    HEATPATH_DEMO: bool.default(false),
    WEB_DIST: z.string().optional(),
    UPLOAD_DIR: z.string().default('.data/uploads'),
    BODY_LIMIT: z.string().default('200kb'),
    SIGN_IN_LIMIT_PER_ACCOUNT: z.coerce.number().int().min(1).default(8),
    SIGN_IN_LIMIT_PER_ADDRESS: z.coerce.number().int().min(1).default(40),
    SIGN_IN_WINDOW_MINUTES: z.coerce.number().int().min(1).default(15),
    LOG_LEVEL: z
      .enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent'])
      .default('info'),
  })
  .transform((env, ctx) => {
    const secret =
      env.SESSION_SECRET ??
      (env.NODE_ENV === 'production'
        ? undefined
        : 'heatpath-local-development-secret-not-for-production');
    if (!secret || secret.length < 32) {
      ctx.addIssue({
        code: 'custom',
        path: ['SESSION_SECRET'],
        message: 'SESSION_SECRET must be set to at least 32 random characters.',
      });
      return z.NEVER;
    }
    const databaseUrl =
      env.DATABASE_URL ??
      `postgres://${encodeURIComponent(env.PGUSER)}:${encodeURIComponent(env.PGPASSWORD)}@${env.PGHOST}:${env.PGPORT}/${env.PGDATABASE}`;
    return {
      env: env.NODE_ENV,
      host: env.HOST,
      port: env.PORT,
      databaseUrl,
      dbPoolMax: env.DB_POOL_MAX,
      sessionSecret: secret,
      sessionTtlHours: env.SESSION_TTL_HOURS,
      cookieSecure: env.COOKIE_SECURE,
      trustProxy: env.TRUST_PROXY,
      demo: env.HEATPATH_DEMO,
      webDist: env.WEB_DIST,
      uploadDir: env.UPLOAD_DIR,
      bodyLimit: env.BODY_LIMIT,
      signInLimits: {
        perAccount: env.SIGN_IN_LIMIT_PER_ACCOUNT,
        perAddress: env.SIGN_IN_LIMIT_PER_ADDRESS,
        windowMinutes: env.SIGN_IN_WINDOW_MINUTES,
      },
      logLevel: env.LOG_LEVEL,
    };
  });

export type Config = z.output<typeof envSchema>;

/** Read the configuration; throws one readable message listing every bad setting. */
export function loadConfig(source: NodeJS.ProcessEnv = process.env): Config {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
    throw new Error(`Heatpath's configuration is not valid:\n  ${lines.join('\n  ')}`);
  }
  return parsed.data;
}
