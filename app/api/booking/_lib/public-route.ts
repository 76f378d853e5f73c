// Routes anyone may call (the public booking page, the provider's webhook): the same zod
// checks and error answers as apiRoute, without signing an actor in.
import { NextResponse, type NextRequest } from "next/server";
import type { ZodType } from "zod";
import { env } from "@/lib/config/env";
import { ApiError, errorResponse } from "@/lib/server/http/errors";

type Ctx<P, Q> = { params: P; query: Q; request: NextRequest };

export function publicRoute<P, Q = undefined>(
  options: { params: ZodType<P>; query?: ZodType<Q>; sameOriginWrites?: boolean },
  handler: (ctx: Ctx<P, Q>) => Promise<unknown>,
) {
  return async (request: NextRequest, context: { params: Promise<Record<string, string | string[]>> }) => {
    try {
      // A browser form (account creation) must come from our own site; the webhook opts out.
      if (options.sameOriginWrites !== false && request.method !== "GET" && request.headers.get("origin") !== new URL(env().NEXTAUTH_URL).origin) {
        throw new ApiError("forbidden", "Cross-site request refused: the Origin header must be this site");
      }
      const params = options.params.parse(await context.params);
      const query = options.query ? options.query.parse(Object.fromEntries(request.nextUrl.searchParams.entries())) : (undefined as Q);
      const result = await handler({ params, query, request });
      return result instanceof Response ? result : NextResponse.json(result);
    } catch (err) {
      return errorResponse(err);
    }
  };
}

export async function jsonBody(request: NextRequest): Promise<unknown> {
  const text = await request.text();
  if (text.length > 64 * 1024) throw new ApiError("payload_too_large", "The request body is too large");
  try {
    return text.trim() ? JSON.parse(text) : {};
  } catch {
    throw new ApiError("invalid_json", "The request body is not valid JSON");
  }
}
