import { NextResponse } from "next/server";
import { getHealth } from "@/lib/server/health/get-health";

export const dynamic = "force-dynamic";

/** Public liveness and readiness: database reachable, embedded or external, migrations up to date. */
export async function GET() {
  const health = await getHealth();
  return NextResponse.json(health, { status: health.status === "unavailable" ? 503 : 200, headers: { "cache-control": "no-store" } });
}
