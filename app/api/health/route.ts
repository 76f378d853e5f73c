import { sql } from "drizzle-orm";
import { NextResponse } from "next/server";
import { db } from "@/db";

// GET /api/health — the web process and its database answer (no sign-in; no data).
export async function GET() {
  try {
    await db.execute(sql`select 1`);
    return NextResponse.json({ ok: true });
  } catch {
    return NextResponse.json({ ok: false, error: { code: "unavailable", message: "Database unreachable" } }, { status: 503 });
  }
}
