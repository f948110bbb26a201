import { handler } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";
import { AppError } from "@/lib/errors";
import { getOrganisationLogo } from "@/lib/organisations/service";

/** The organisation's logo, as printed on the pack's cover. */
export const GET = handler(async () => {
  const actor = await requireApiActor("profile:read");
  const logo = await getOrganisationLogo(actor);
  if (!logo) throw AppError.notFound("Logo");
  return new Response(new Blob([logo.data as Uint8Array<ArrayBuffer>]), {
    headers: { "content-type": logo.type, "cache-control": "private, no-cache" },
  });
});
