"use client";

import * as Dialog from "@radix-ui/react-dialog";
import { useState } from "react";
import { FormMessage, PrimaryButton, SecondaryButton } from "@/app/_components/form";
import { revokeTokenAction } from "./actions";

export function RevokeButton({ tokenId, name }: { tokenId: string; name: string }) {
  const [failure, setFailure] = useState<string | null>(null);
  const [open, setOpen] = useState(false);
  return (
    <Dialog.Root open={open} onOpenChange={setOpen}>
      <Dialog.Trigger asChild>
        <SecondaryButton type="button">Revoke…</SecondaryButton>
      </Dialog.Trigger>
      <Dialog.Portal>
        <Dialog.Overlay className="fixed inset-0 bg-black/40" />
        <Dialog.Content className="fixed left-1/2 top-1/2 w-[min(92vw,28rem)] -translate-x-1/2 -translate-y-1/2 rounded-lg bg-paper p-6 shadow-xl">
          <Dialog.Title className="text-lg font-bold">Revoke “{name}”?</Dialog.Title>
          <Dialog.Description className="mt-2 text-sm text-muted">
            Anything using it stops working at once. This cannot be undone; create a new token if needed.
          </Dialog.Description>
          {failure && <FormMessage tone="error">{failure}</FormMessage>}
          <div className="mt-5 flex justify-end gap-2">
            <Dialog.Close asChild>
              <SecondaryButton type="button">Keep it</SecondaryButton>
            </Dialog.Close>
            <PrimaryButton
              type="button"
              onClick={async () => {
                const result = await revokeTokenAction({ tokenId });
                if (result.ok) setOpen(false);
                else setFailure(result.message);
              }}
            >
              Revoke
            </PrimaryButton>
          </div>
        </Dialog.Content>
      </Dialog.Portal>
    </Dialog.Root>
  );
}
