// The process logger: JSON lines on stdout, secrets redacted.
import { pino } from 'pino';
import type { Logger } from 'pino';

export function createLogger(level: string): Logger {
  return pino({
    level,
    redact: ['req.headers.cookie', 'res.headers["set-cookie"]', 'req.body.password', '*.password'],
  });
}
