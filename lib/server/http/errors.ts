import "server-only";
import { NextResponse } from "next/server";
import { ZodError } from "zod";

export type ErrorCode =
  | "bad_request" | "invalid_json" | "validation_failed" | "unauthorized" | "forbidden" | "not_found"
  | "conflict" | "payload_too_large" | "unprocessable" | "rate_limited" | "internal_error";

const statusOf: Record<ErrorCode, number> = {
  bad_request: 400, invalid_json: 400, validation_failed: 400, unauthorized: 401, forbidden: 403,
  not_found: 404, conflict: 409, payload_too_large: 413, unprocessable: 422, rate_limited: 429,
  internal_error: 500,
};

/** The one error type: thrown anywhere on the server, answered as `{ error: { code, message } }`. */
export class ApiError extends Error {
  constructor(public readonly code: ErrorCode, message: string, public readonly issues?: unknown) {
    super(message);
  }
  get status() {
    return statusOf[this.code];
  }
}

export const notFound = (what = "Not found") => new ApiError("not_found", what);
export const forbidden = (what = "You may not do that") => new ApiError("forbidden", what);
export const unauthorized = () => new ApiError("unauthorized", "Sign in first, or send a valid Bearer token");

export function errorResponse(err: unknown): NextResponse {
  if (err instanceof ZodError) {
    const issues = err.issues.map((i) => ({ path: i.path.join("."), message: i.message }));
    return NextResponse.json(
      { error: { code: "validation_failed", message: issues.map((i) => `${i.path || "body"}: ${i.message}`).join("; "), issues } },
      { status: 400 },
    );
  }
  if (err instanceof ApiError) {
    const body: { code: string; message: string; issues?: unknown } = { code: err.code, message: err.message };
    if (err.issues !== undefined) body.issues = err.issues;
    return NextResponse.json({ error: body }, { status: err.status });
  }
  console.error("unhandled error", err);
  return NextResponse.json({ error: { code: "internal_error", message: "Something went wrong on our side" } }, { status: 500 });
}
