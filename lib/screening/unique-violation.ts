// PostgreSQL's unique_violation, as node-postgres reports it (drizzle wraps it in an error whose `cause` is the
// original). Used to turn a lost race on a unique index into a retry or a clear 409 rather than a 500.
export function isUniqueViolation(error: unknown, constraint: string): boolean {
  for (let current: unknown = error, depth = 0; current && depth < 3; depth++) {
    const candidate = current as { code?: unknown; constraint?: unknown; cause?: unknown };
    if (candidate.code === "23505" && candidate.constraint === constraint) return true;
    current = candidate.cause;
  }
  return false;
}
