import type { Metadata } from "next";
import { requirePermission } from "@/lib/auth/guard";
import { EntryForm } from "../entry-form";

export const metadata: Metadata = { title: "New library hazard" };

export default async function NewLibraryHazardPage() {
  await requirePermission("hazard-library:manage");
  return (
    <div className="max-w-4xl space-y-4">
      <h1 className="text-2xl font-bold">New library hazard</h1>
      <EntryForm entryId={null} />
    </div>
  );
}
