import type { Metadata } from "next";
import Link from "next/link";
import { getComponent } from "@/assessments/load-register/service";
import { requirePermission } from "@/lib/auth/guard";
import { can } from "@/lib/permissions";
import { ComponentForm } from "../component-form";
import { Attachments } from "./attachments";
import { foundOr404 } from "@/lib/pages";

export const metadata: Metadata = { title: "Component" };

export default async function ComponentPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePermission("components:read");
  const { id } = await params;
  const c = await foundOr404(getComponent(actor, id));
  const editable = can(actor, "components:write");
  return (
    <div className="max-w-3xl space-y-4">
      <Link href="/load-register" className="font-bold text-accent underline">
        ← Load register
      </Link>
      <h1 className="text-2xl font-bold">{c.name}</h1>
      {editable && (
        <ComponentForm
          componentId={c.id}
          initial={{
            name: c.name,
            massKg: c.massKg,
            lengthMm: c.lengthMm,
            widthMm: c.widthMm,
            heightMm: c.heightMm,
            grip: c.grip,
            massSource: c.massSource,
            notes: c.notes,
          }}
        />
      )}
      <Attachments
        componentId={c.id}
        attachments={c.attachments.map((a) => ({ ...a, createdAt: a.createdAt.toISOString() }))}
        editable={editable}
      />
    </div>
  );
}
