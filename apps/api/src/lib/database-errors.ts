// Tells a database that cannot serve right now (down, restarting, or every pooled connection
// busy past the acquire timeout) from a query that is wrong: the first is worth a retry and gets
// 503, the second is a bug or bad input.
import { BaseError, ConnectionError, DatabaseError } from 'sequelize';

/** SQLSTATE classes and codes that mean "not now" rather than "never". */
function isUnavailableCode(code: string): boolean {
  // 08: connection exception; 57P01–57P03: admin shutdown, crash shutdown, cannot connect now;
  // 53300: too many connections.
  return code.startsWith('08') || /^57P0[123]$/.test(code) || code === '53300';
}

/** Codes of a socket that dropped under a query (the server went away mid-request). */
const droppedSocket = /^(ECONNRESET|ECONNREFUSED|EPIPE|ETIMEDOUT|EHOSTUNREACH|ENOTFOUND)$/;

function codeOf(error: unknown): string {
  const code = (error as { code?: unknown } | null)?.code;
  return typeof code === 'string' ? code : '';
}

export function isDatabaseUnavailable(error: unknown): boolean {
  if (error instanceof ConnectionError) return true;
  if (!(error instanceof BaseError)) return false;
  const parent = (error as DatabaseError).parent as unknown;
  const code = codeOf(parent);
  if (isUnavailableCode(code) || droppedSocket.test(code)) return true;
  // pg reports a connection that ended under a query without a code.
  const message = parent instanceof Error ? parent.message : error.message;
  return /Connection terminated|connection is closed|Client has encountered a connection error/i.test(
    message,
  );
}

/** SQLSTATE 22021/22P05: text PostgreSQL cannot store (a NUL character, a broken sequence). */
export function isUnstorableText(error: unknown): boolean {
  if (!(error instanceof DatabaseError)) return false;
  return ['22021', '22P05'].includes(codeOf(error.parent));
}
