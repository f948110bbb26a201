"use client";

import { useState, useTransition } from "react";
import { FormMessage, SecondaryButton } from "@/app/_components/form";
import { restoreStarterAction } from "./actions";

/** Adds the starter hazards the library lacks; entries already there by name are left as they are. */
export function RestoreStarterButton() {
  const [pending, start] = useTransition();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  return (
    <div className="space-y-2">
      <SecondaryButton
        type="button"
        disabled={pending}
        onClick={() =>
          start(async () => {
            const result = await restoreStarterAction();
            setMessage({ ok: result.ok, text: result.message ?? "" });
          })
        }
      >
        {pending ? "Adding…" : "Add the starter hazards"}
      </SecondaryButton>
      {message && <FormMessage tone={message.ok ? "success" : "error"}>{message.text}</FormMessage>}
    </div>
  );
}
