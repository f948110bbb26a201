import type { Metadata } from "next";
import { requirePermission } from "@/lib/auth/guard";
import { ComponentForm } from "../component-form";

export const metadata: Metadata = { title: "New component" };

export default async function NewComponentPage() {
  await requirePermission("components:write");
  return (
    <div className="max-w-3xl space-y-4">
      <h1 className="text-2xl font-bold">New component</h1>
      <ComponentForm componentId={null} />
    </div>
  );
}
