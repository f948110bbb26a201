"use server";

import { revalidatePath } from "next/cache";
import { runAction } from "@/lib/actions";
import { getActor } from "@/lib/auth/session";
import { changeRole, inviteUser, resendInvite, setActive } from "@/lib/users/service";

const mailNote = (status: "sent" | "failed") =>
  status === "sent"
    ? "The invitation e-mail was sent."
    : "The invitation e-mail could not be sent: see Sent e-mail, then use Resend invitation.";

export async function inviteUserAction(values: unknown) {
  return runAction(async () => {
    const { mail } = await inviteUser(await getActor(), values);
    revalidatePath("/admin/users");
    return { message: `Invited. ${mailNote(mail.status)}` };
  });
}

export async function resendInviteAction(values: unknown) {
  return runAction(async () => {
    const mail = await resendInvite(await getActor(), values);
    revalidatePath("/admin/users");
    return { message: mailNote(mail.status) };
  });
}

export async function changeRoleAction(values: unknown) {
  return runAction(async () => {
    await changeRole(await getActor(), values);
    revalidatePath("/admin/users");
    return { message: "Role changed." };
  });
}

export async function setActiveAction(values: unknown) {
  return runAction(async () => {
    await setActive(await getActor(), values);
    revalidatePath("/admin/users");
    return { message: "Saved." };
  });
}
