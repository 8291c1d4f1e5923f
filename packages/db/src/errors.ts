// Recognising MariaDB's errors through drizzle's wrapping (DrizzleQueryError keeps the driver error as `cause`).

function findInCauses(error: unknown, test: (e: object) => boolean): boolean {
  let cause: unknown = error;
  for (let depth = 0; cause && depth < 5; depth++) {
    if (typeof cause === "object" && test(cause)) return true;
    cause = typeof cause === "object" && "cause" in cause ? cause.cause : undefined;
  }
  return false;
}

export function isDuplicateKeyError(error: unknown): boolean {
  return findInCauses(error, (e) => "code" in e && e.code === "ER_DUP_ENTRY");
}

// Driver and server codes that mean "the database cannot serve us now", not "this request is wrong".
const unavailableCodes = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "ETIMEDOUT",
  "EHOSTUNREACH",
  "ENETUNREACH",
  "ENOTFOUND",
  "EPIPE",
  "PROTOCOL_CONNECTION_LOST",
  "PROTOCOL_SEQUENCE_TIMEOUT",
  "ER_CON_COUNT_ERROR",
  "ER_SERVER_SHUTDOWN",
  "ER_TOO_MANY_USER_CONNECTIONS",
]);

/** True when the error says MariaDB is unreachable, shutting down, out of connections or the pool is closed. */
export function isDatabaseUnavailableError(error: unknown): boolean {
  return findInCauses(
    error,
    (e) =>
      ("code" in e && typeof e.code === "string" && unavailableCodes.has(e.code)) ||
      ("fatal" in e && e.fatal === true) ||
      (e instanceof Error && /^Pool is closed|closed state/.test(e.message)),
  );
}
