import { NextResponse } from "next/server";
import { listLibrary } from "@/assessments/hazard-library/queries";
import { handler } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

/** The organisation's hazard library, whole: the wizard's hazards step copies entries from it. */
export const GET = handler(async () => {
  const actor = await requireApiActor("hazard-library:read");
  return NextResponse.json({ items: await listLibrary(actor) });
});
