import "server-only";

/** PostgreSQL's SQLSTATE of a failed query, whether the driver's error comes bare or wrapped by Drizzle (as `cause`). */
export function pgErrorCode(err: unknown): string | undefined {
  const withCode = (e: unknown) => (e as { code?: unknown } | undefined)?.code;
  const code = withCode((err as { cause?: unknown } | undefined)?.cause) ?? withCode(err);
  return typeof code === "string" ? code : undefined;
}
