/** Drizzle wraps driver errors; the SQLite code may sit on the error or on its cause. */
export function isUniqueViolation(err: unknown): boolean {
  const e = err as { code?: string; cause?: { code?: string } };
  return e.code === 'SQLITE_CONSTRAINT_UNIQUE' || e.cause?.code === 'SQLITE_CONSTRAINT_UNIQUE';
}
