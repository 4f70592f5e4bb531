// Heatpath's settings, read from the environment and validated once. Every setting has a safe
// local default except the session secret outside development and test.
import { mailRecipientSchema } from '@heatpath/contracts';
import type { MailRecipient } from '@heatpath/contracts';
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
    DB_POOL_ACQUIRE_MS: z.coerce.number().int().min(100).max(60_000).default(3000),
    DB_CONNECT_TIMEOUT_MS: z.coerce.number().int().min(100).max(60_000).default(2000),
    SESSION_SECRET: z.string().optional(),
    SESSION_TTL_HOURS: z.coerce
      .number()
      .positive()
      .max(24 * 30)
      .default(12),
    // Unset: Secure cookies and HSTS in production. Only a plain-http loopback start sets false.
    COOKIE_SECURE: bool.optional(),
    TRUST_PROXY: bool.default(false),
    HEATPATH_DEMO: bool.default(false),
    WEB_DIST: z.string().optional(),
    UPLOAD_DIR: z.string().default('.data/uploads'),
    BODY_LIMIT: z.string().default('200kb'),
    SIGN_IN_LIMIT_PER_ACCOUNT: z.coerce.number().int().min(1).default(8),
    SIGN_IN_LIMIT_PER_DEVICE: z.coerce.number().int().min(1).default(8),
    SIGN_IN_LIMIT_PER_ADDRESS: z.coerce.number().int().min(1).default(40),
    SIGN_IN_WINDOW_MINUTES: z.coerce.number().int().min(1).default(15),
    SIGN_IN_DEVICE_DAYS: z.coerce.number().int().min(1).max(730).default(180),
    // E-mail: any SMTP server. npm start runs a local fake on loopback and points these at it.
    SMTP_HOST: z.string().min(1).default('127.0.0.1'),
    SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(2525),
    SMTP_SECURE: bool.default(false),
    SMTP_USER: z.string().optional(),
    SMTP_PASSWORD: z.string().optional(),
    SMTP_FROM: z.string().default('Heatpath <heatpath@heatpath.localhost>'),
    PUBLIC_URL: z
      .url({
        error: 'PUBLIC_URL must be the address people open, like https://heatpath.example.test.',
      })
      .optional(),
    MAIL_WORKER: bool.default(true),
    MAIL_POLL_MS: z.coerce.number().int().min(50).max(60_000).default(1000),
    MAIL_RETRY_BASE_MS: z.coerce.number().int().min(10).default(5000),
    MAIL_RETRY_MAX_MS: z.coerce
      .number()
      .int()
      .min(10)
      .default(10 * 60_000),
    MAIL_MAX_REJECTIONS: z.coerce.number().int().min(1).max(100).default(5),
    INVITATION_TTL_HOURS: z.coerce
      .number()
      .positive()
      .max(24 * 30)
      .default(72),
    PASSWORD_RESET_TTL_MINUTES: z.coerce
      .number()
      .positive()
      .max(24 * 60)
      .default(60),
    PASSWORD_RESET_LIMIT_PER_ACCOUNT: z.coerce.number().int().min(1).default(3),
    PASSWORD_RESET_LIMIT_PER_ADDRESS: z.coerce.number().int().min(1).default(20),
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
    const from = parseFromSetting(env.SMTP_FROM);
    if (!from) {
      ctx.addIssue({
        code: 'custom',
        path: ['SMTP_FROM'],
        message:
          'SMTP_FROM must be an address, or a name and an address: Heatpath <mail@example.test>.',
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
      dbPool: {
        poolMax: env.DB_POOL_MAX,
        acquireTimeoutMs: env.DB_POOL_ACQUIRE_MS,
        connectTimeoutMs: env.DB_CONNECT_TIMEOUT_MS,
      },
      sessionSecret: secret,
      sessionTtlHours: env.SESSION_TTL_HOURS,
      cookieSecure: env.COOKIE_SECURE ?? env.NODE_ENV === 'production',
      trustProxy: env.TRUST_PROXY,
      demo: env.HEATPATH_DEMO,
      webDist: env.WEB_DIST,
      uploadDir: env.UPLOAD_DIR,
      bodyLimit: env.BODY_LIMIT,
      signInLimits: {
        perAccount: env.SIGN_IN_LIMIT_PER_ACCOUNT,
        perDevice: env.SIGN_IN_LIMIT_PER_DEVICE,
        perAddress: env.SIGN_IN_LIMIT_PER_ADDRESS,
        windowMinutes: env.SIGN_IN_WINDOW_MINUTES,
      },
      signInDeviceDays: env.SIGN_IN_DEVICE_DAYS,
      logLevel: env.LOG_LEVEL,
      mail: {
        host: env.SMTP_HOST,
        port: env.SMTP_PORT,
        secure: env.SMTP_SECURE,
        user: env.SMTP_USER,
        password: env.SMTP_PASSWORD,
        from,
        publicUrl: (env.PUBLIC_URL ?? `http://${env.HOST}:${env.PORT}`).replace(/\/+$/, ''),
        worker: {
          enabled: env.MAIL_WORKER,
          pollMs: env.MAIL_POLL_MS,
          retryBaseMs: env.MAIL_RETRY_BASE_MS,
          retryMaxMs: Math.max(env.MAIL_RETRY_MAX_MS, env.MAIL_RETRY_BASE_MS),
          maxRejections: env.MAIL_MAX_REJECTIONS,
        },
      },
      accountTokens: {
        invitationTtlMinutes: env.INVITATION_TTL_HOURS * 60,
        passwordResetTtlMinutes: env.PASSWORD_RESET_TTL_MINUTES,
      },
      passwordResetLimits: {
        perAccount: env.PASSWORD_RESET_LIMIT_PER_ACCOUNT,
        perAddress: env.PASSWORD_RESET_LIMIT_PER_ADDRESS,
        windowMinutes: env.SIGN_IN_WINDOW_MINUTES,
      },
    };
  });

/** "Name <address>" or a bare address, checked like every other address Heatpath sends to. */
function parseFromSetting(value: string): MailRecipient | null {
  const match = /^\s*(?:(.*?)\s*<([^<>]+)>|([^<>\s]+))\s*$/.exec(value);
  if (!match) return null;
  const parsed = mailRecipientSchema.safeParse({
    name: match[1] ? match[1].replace(/^"|"$/g, '') : undefined,
    address: match[2] ?? match[3],
  });
  return parsed.success ? parsed.data : null;
}

export type Config = z.output<typeof envSchema>;
export type MailConfig = Config['mail'];

/** Read the configuration; throws one readable message listing every bad setting. */
export function loadConfig(source: NodeJS.ProcessEnv = process.env): Config {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
    throw new Error(`Heatpath's configuration is not valid:\n  ${lines.join('\n  ')}`);
  }
  return parsed.data;
}
