import NextAuth from "next-auth";
import { NextResponse, type NextRequest } from "next/server";
import { authOptions } from "@/lib/server/auth/options";
import { clientIp, isSignInLimited, recordSignInFailure } from "@/lib/server/auth/sign-in-limit";

const nextAuth = NextAuth(authOptions);

// GET /api/auth/* — next-auth's session, csrf and providers endpoints.
export const GET = nextAuth;

// POST /api/auth/* — sign-in and sign-out; a credentials sign-in over the failure limit gets 429.
export async function POST(request: NextRequest, context: { params: Promise<{ nextauth: string[] }> }) {
  const { nextauth } = await context.params;
  if (nextauth.join("/") === "callback/credentials") {
    const form = await request.clone().formData().catch(() => null);
    const email = String(form?.get("email") ?? "").trim().toLowerCase();
    const ip = clientIp(request.headers);
    if (email && (await isSignInLimited(email, ip))) {
      await recordSignInFailure(email, ip, "rate_limited");
      return NextResponse.json(
        {
          url: new URL("/sign-in?error=RateLimited", request.url).toString(),
          error: { code: "rate_limited", message: "Too many failed sign-ins: wait 15 minutes and try again" },
        },
        { status: 429 },
      );
    }
  }
  return nextAuth(request, context);
}
