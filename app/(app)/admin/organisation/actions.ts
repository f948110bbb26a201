"use server";

import { revalidatePath } from "next/cache";
import { runAction } from "@/lib/actions";
import { getActor } from "@/lib/auth/session";
import { AppError } from "@/lib/errors";
import { setOrganisationLogo, updateOrganisationSettings } from "@/lib/organisations/service";

export async function saveSettingsAction(values: unknown) {
  return runAction(async () => {
    await updateOrganisationSettings(await getActor(), values);
    revalidatePath("/admin/organisation");
    return { message: "Settings saved." };
  });
}

export async function setLogoAction(form: FormData) {
  return runAction(async () => {
    const actor = await getActor();
    const file = form.get("logo");
    if (!(file instanceof File) || (file.size === 0 && !file.name))
      throw new AppError("validation", "Choose a logo file", [{ path: "logo", message: "Choose a PNG or JPEG file" }]);
    await setOrganisationLogo(actor, new Uint8Array(await file.arrayBuffer()));
    revalidatePath("/admin/organisation");
    return { message: "Logo saved: it prints on the cover of packs issued from now on." };
  });
}

export async function removeLogoAction() {
  return runAction(async () => {
    await setOrganisationLogo(await getActor(), null);
    revalidatePath("/admin/organisation");
    return { message: "Logo removed." };
  });
}
