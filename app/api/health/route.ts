import { NextResponse } from "next/server";
import { pingDatabase } from "@/db/queries/health";
import { route } from "@/lib/http";

export const dynamic = "force-dynamic";

/** Public: for load balancers and the benchmark's baseline. Says nothing but "up". */
export const GET = route(async () => {
  const ok = await pingDatabase();
  return NextResponse.json({ ok }, { status: ok ? 200 : 503 });
});
