import { NextResponse } from "next/server";
import { handler } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";
import { permissionsOf } from "@/lib/permissions";

/** Who is calling: the signed-in user, their role and organisation (reads no business table). */
export const GET = handler(async () => {
  const actor = await requireApiActor("profile:read");
  return NextResponse.json({
    id: actor.id,
    name: actor.name,
    email: actor.email,
    role: actor.role,
    organisationId: actor.organisationId,
    // A token's scope, or the role's; and how the caller came in ("session" or "token").
    permissions: permissionsOf(actor),
    via: actor.auth?.via ?? "session",
  });
});
