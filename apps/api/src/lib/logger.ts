// The process logger: JSON lines on stdout, secrets redacted, and errors logged without the SQL
// or the values bound to it (a failed query's parameters are a customer's notes and details).
import { pino } from 'pino';
import type { DestinationStream, Logger, SerializedError } from 'pino';

// Properties Sequelize and pg put on errors that carry the statement, its values, or rows.
const revealing = [
  'sql',
  'parameters',
  'parent',
  'original',
  'errors',
  'fields',
  'value',
  'instance',
  'detail',
  'where',
  'internalQuery',
];

/** pino's error serializer, minus anything that could hold a query's text or values. */
export function serializeError(error: unknown): SerializedError {
  const full = pino.stdSerializers.err(error as Error) as SerializedError & Record<string, unknown>;
  const serialized = Object.fromEntries(
    Object.entries(full).filter(([key]) => !revealing.includes(key)),
  ) as SerializedError & Record<string, unknown>;
  const parent = (error as { parent?: { code?: unknown } } | null)?.parent;
  if (typeof parent?.code === 'string') serialized.dbCode = parent.code;
  // PostgreSQL quotes the offending value in some messages (invalid input syntax for type uuid:
  // "…"); keep the sentence, drop the value.
  if (typeof serialized.message === 'string')
    serialized.message = serialized.message.replace(/:\s*"[^]*$/, ': "…"');
  if (typeof serialized.stack === 'string')
    serialized.stack = serialized.stack.replace(/:\s*"[^\n]*/, ': "…"');
  return serialized;
}

/** The logger; tests pass a destination to read what was logged. */
export function createLogger(level: string, destination?: DestinationStream): Logger {
  const options = {
    level,
    redact: ['req.headers.cookie', 'res.headers["set-cookie"]', 'req.body.password', '*.password'],
    serializers: { err: serializeError },
  };
  return destination ? pino(options, destination) : pino(options);
}
