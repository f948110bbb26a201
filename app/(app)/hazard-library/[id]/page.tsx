import type { Metadata } from "next";
import { getEntry } from "@/assessments/hazard-library/service";
import { requirePermission } from "@/lib/auth/guard";
import { EntryForm } from "../entry-form";
import { foundOr404 } from "@/lib/pages";

export const metadata: Metadata = { title: "Edit library hazard" };

export default async function EditLibraryHazardPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePermission("hazard-library:manage");
  const { id } = await params;
  const entry = await foundOr404(getEntry(actor, id));
  return (
    <div className="max-w-4xl space-y-4">
      <h1 className="text-2xl font-bold">Edit library hazard</h1>
      <EntryForm entryId={entry.id} initial={entry.input} />
    </div>
  );
}
