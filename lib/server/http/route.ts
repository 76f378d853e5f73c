import "server-only";
import { NextResponse, type NextRequest } from "next/server";
import { z, type ZodType } from "zod";
import { env } from "@/lib/config/env";
import type { SignedInActor } from "../access";
import { currentActor } from "../auth/actor";
import { ApiError, errorResponse, unauthorized } from "./errors";

const MAX_JSON_BYTES = 1024 * 1024;
const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

type Ctx<P, B, Q> = { actor: SignedInActor; params: P; body: B; query: Q; request: NextRequest };

type Options<P, B, Q> = { params?: ZodType<P>; body?: ZodType<B>; query?: ZodType<Q> };

/**
 * Every API route goes through here: it signs the actor in (session or Bearer), refuses
 * cross-site writes, validates params/query/body with zod, and turns any error into
 * `{ error: { code, message } }`. Access decisions stay in the data-access layer.
 */
export function apiRoute<P = Record<string, never>, B = undefined, Q = undefined>(
  options: Options<P, B, Q>,
  handler: (ctx: Ctx<P, B, Q>) => Promise<unknown>,
) {
  return async (request: NextRequest, context: { params: Promise<Record<string, string | string[]>> }) => {
    try {
      checkOrigin(request);
      const actor = await currentActor();
      if (!actor) throw unauthorized();
      const params = options.params ? options.params.parse(await context.params) : ({} as P);
      const query = options.query
        ? options.query.parse(Object.fromEntries(request.nextUrl.searchParams.entries()))
        : (undefined as Q);
      const body = options.body ? options.body.parse(await readJson(request)) : (undefined as B);
      const result = await handler({ actor, params, body, query, request });
      return result instanceof Response ? result : NextResponse.json(result);
    } catch (err) {
      return errorResponse(err);
    }
  };
}

// Browser sessions ride on cookies, so a state-changing request must come from our own origin.
// A Bearer token is never sent by a browser on its own, so scripts need no Origin.
function checkOrigin(request: NextRequest) {
  if (SAFE_METHODS.has(request.method)) return;
  if (request.headers.get("authorization")?.toLowerCase().startsWith("bearer ")) return;
  const origin = request.headers.get("origin");
  const allowed = new URL(env().NEXTAUTH_URL).origin;
  if (origin !== allowed) throw new ApiError("forbidden", "Cross-site request refused: the Origin header must be this site");
}

async function readJson(request: NextRequest): Promise<unknown> {
  const length = Number(request.headers.get("content-length") ?? 0);
  if (length > MAX_JSON_BYTES) throw new ApiError("payload_too_large", "The request body is over 1 MiB");
  const text = await request.text();
  if (text.length > MAX_JSON_BYTES) throw new ApiError("payload_too_large", "The request body is over 1 MiB");
  if (text.trim() === "") return {};
  try {
    return JSON.parse(text);
  } catch {
    throw new ApiError("invalid_json", "The request body is not valid JSON");
  }
}

export const idParams = z.object({ id: z.string().uuid("must be an id (uuid)") });
export const created = (data: unknown) => NextResponse.json(data, { status: 201 });
