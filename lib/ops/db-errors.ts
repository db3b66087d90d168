// Recognising "the database is not there" among the errors pg and drizzle throw. Pure: middleware, route
// handlers, server actions and scripts all ask the same question.

// SQLSTATE class 08 (connection exception), admin or crash shutdown (57P01-57P03) and "cannot connect now".
const DOWN_SQLSTATES = /^(08\d{3}|57P0[1-3])$/;
// Socket-level failures from node:net when the server is stopped, unreachable or drops the connection.
const DOWN_SOCKET_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'EPIPE', 'ETIMEDOUT', 'EHOSTUNREACH', 'ENOTFOUND']);
// What pg says, without a code, when a pooled client dies or a connection cannot be made in time.
const DOWN_MESSAGES =
  /timeout exceeded when trying to connect|Connection terminated|Client has encountered a connection error|Connection refused|the database system is (shutting down|starting up)/i;

type Coded = { code?: unknown; message?: unknown; cause?: unknown; errors?: unknown };

function causes(err: unknown): Coded[] {
  const out: Coded[] = [];
  let e: unknown = err;
  // Drizzle wraps the pg error in `cause`; an AggregateError (IPv4 and IPv6 both refused) lists them in `errors`.
  for (let depth = 0; depth < 5 && e && typeof e === 'object'; depth++) {
    const c = e as Coded;
    out.push(c);
    if (Array.isArray(c.errors)) out.push(...(c.errors.filter((x) => x && typeof x === 'object') as Coded[]));
    e = c.cause;
  }
  return out;
}

/** True when the error means PostgreSQL cannot be reached (stopped, restarting, unreachable), not a bad query. */
export function isDatabaseDown(err: unknown): boolean {
  return causes(err).some((c) => {
    const code = typeof c.code === 'string' ? c.code : '';
    if (DOWN_SQLSTATES.test(code) || DOWN_SOCKET_CODES.has(code)) return true;
    return typeof c.message === 'string' && DOWN_MESSAGES.test(c.message);
  });
}
