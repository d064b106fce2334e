import { NextResponse } from "next/server";
import { db } from "@/lib/server/db";

export const dynamic = "force-dynamic";

// GET /api/health — the app answers; reports whether the database does (503 when it does not)
export async function GET() {
  const started = performance.now();
  try {
    await db().query("SELECT 1");
    return NextResponse.json({ status: "ok", database: { state: "up", latencyMs: Math.round((performance.now() - started) * 10) / 10 } });
  } catch {
    return NextResponse.json({ status: "degraded", database: { state: "down" } }, { status: 503 });
  }
}
