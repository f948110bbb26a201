"use client";

import * as Dialog from "@radix-ui/react-dialog";
import { useState, useTransition } from "react";
import { PrimaryButton, SecondaryButton } from "@/app/_components/form";
import { ROLES, type Role } from "@/db/schema";
import type { ActionResult } from "@/lib/actions";
import { ROLE_LABELS } from "@/lib/users/schemas";
import { changeRoleAction, resendInviteAction, setActiveAction } from "./actions";

interface Props {
  user: { id: string; name: string; role: Role; active: boolean; pending: boolean };
  isSelf: boolean;
}

export function UserControls({ user, isSelf }: Props) {
  const [pending, startTransition] = useTransition();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [confirmOpen, setConfirmOpen] = useState(false);

  const run = (action: () => Promise<ActionResult>) =>
    startTransition(async () => {
      const result = await action();
      setMessage({ ok: result.ok, text: result.ok ? (result.message ?? "Saved.") : result.message });
    });

  if (isSelf) return <span className="text-sm text-muted">This is you</span>;

  return (
    <div className="flex flex-wrap items-center gap-2">
      <label className="sr-only" htmlFor={`role-${user.id}`}>
        Role of {user.name}
      </label>
      <select
        id={`role-${user.id}`}
        defaultValue={user.role}
        disabled={pending || !user.active}
        onChange={(e) => run(() => changeRoleAction({ userId: user.id, role: e.target.value }))}
        className="rounded border border-rule bg-white px-2 py-1.5"
      >
        {ROLES.map((role) => (
          <option key={role} value={role}>
            {ROLE_LABELS[role]}
          </option>
        ))}
      </select>
      {user.pending && user.active && (
        <SecondaryButton
          type="button"
          disabled={pending}
          onClick={() => run(() => resendInviteAction({ userId: user.id }))}
        >
          Resend invitation
        </SecondaryButton>
      )}
      {user.active ? (
        <Dialog.Root open={confirmOpen} onOpenChange={setConfirmOpen}>
          <Dialog.Trigger asChild>
            <SecondaryButton type="button" disabled={pending} className="text-danger">
              Deactivate
            </SecondaryButton>
          </Dialog.Trigger>
          <Dialog.Portal>
            <Dialog.Overlay className="fixed inset-0 bg-black/40" />
            <Dialog.Content className="fixed left-1/2 top-1/2 w-[min(92vw,28rem)] -translate-x-1/2 -translate-y-1/2 rounded-lg bg-paper p-6 shadow-xl">
              <Dialog.Title className="text-lg font-bold">Deactivate {user.name}?</Dialog.Title>
              <Dialog.Description className="mt-2 text-sm text-muted">
                They are signed out at once and cannot sign in again until reactivated. Their past work and signatures
                stay on record.
              </Dialog.Description>
              <div className="mt-5 flex justify-end gap-2">
                <Dialog.Close asChild>
                  <SecondaryButton type="button">Keep active</SecondaryButton>
                </Dialog.Close>
                <PrimaryButton
                  type="button"
                  className="bg-danger"
                  onClick={() => {
                    setConfirmOpen(false);
                    run(() => setActiveAction({ userId: user.id, active: false }));
                  }}
                >
                  Deactivate
                </PrimaryButton>
              </div>
            </Dialog.Content>
          </Dialog.Portal>
        </Dialog.Root>
      ) : (
        <SecondaryButton
          type="button"
          disabled={pending}
          onClick={() => run(() => setActiveAction({ userId: user.id, active: true }))}
        >
          Reactivate
        </SecondaryButton>
      )}
      {message && (
        <span
          role={message.ok ? "status" : "alert"}
          className={`text-sm ${message.ok ? "text-muted" : "font-bold text-danger"}`}
        >
          {message.text}
        </span>
      )}
    </div>
  );
}
