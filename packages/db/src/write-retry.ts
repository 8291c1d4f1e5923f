// Retrying a whole transaction when InnoDB (or Galera) gives it up because of another one.
// Decision 010: every top-level `db.transaction()` gets this through createDb(); savepoints don't.

/** ER_LOCK_DEADLOCK: InnoDB chose this transaction as a deadlock victim (Galera reports a failed certification the same way). */
export const ER_LOCK_DEADLOCK = 1213;
/** ER_LOCK_WAIT_TIMEOUT: innodb_lock_wait_timeout passed while waiting for a row lock. */
export const ER_LOCK_WAIT_TIMEOUT = 1205;

export type WriteRetryOptions = {
  /** How many times the work runs at most, the first included. */
  attempts?: number;
  /** Backoff before attempt n+1 is a random wait in [0, min(maxDelayMs, baseDelayMs · 2^n)) ("full jitter"). */
  baseDelayMs?: number;
  maxDelayMs?: number;
  /** Told about each retry (the API logs it); never about the final failure, which is thrown. */
  onRetry?: (info: { attempt: number; errno: number; delayMs: number }) => void;
};

export const defaultWriteRetry = { attempts: 6, baseDelayMs: 20, maxDelayMs: 400 } as const;

/** The MariaDB error number anywhere in an error's cause chain (drizzle wraps driver errors). */
export function databaseErrno(error: unknown): number | undefined {
  let cause: unknown = error;
  for (let depth = 0; cause && depth < 5; depth++) {
    if (typeof cause === "object" && "errno" in cause && typeof cause.errno === "number") return cause.errno;
    cause = typeof cause === "object" && "cause" in cause ? cause.cause : undefined;
  }
  return undefined;
}

/** True when running the same transaction again may well succeed. */
export function isRetryableWriteError(error: unknown): boolean {
  const errno = databaseErrno(error);
  return errno === ER_LOCK_DEADLOCK || errno === ER_LOCK_WAIT_TIMEOUT;
}

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** Runs `work` again (after a jittered wait) while it fails with a deadlock or lock-wait timeout. */
export async function withWriteRetry<T>(work: () => Promise<T>, options: WriteRetryOptions = {}): Promise<T> {
  const attempts = Math.max(1, options.attempts ?? defaultWriteRetry.attempts);
  const base = options.baseDelayMs ?? defaultWriteRetry.baseDelayMs;
  const cap = options.maxDelayMs ?? defaultWriteRetry.maxDelayMs;
  for (let attempt = 1; ; attempt++) {
    try {
      return await work();
    } catch (error) {
      if (attempt >= attempts || !isRetryableWriteError(error)) throw error;
      const delayMs = Math.floor(Math.random() * Math.min(cap, base * 2 ** attempt));
      options.onRetry?.({ attempt, errno: databaseErrno(error)!, delayMs });
      await sleep(delayMs);
    }
  }
}
