import type { Metadata } from "next";
import Link from "next/link";
import { requirePermission } from "@/lib/auth/guard";
import { can } from "@/lib/permissions";
import { RegisterTable } from "./register-table";

export const metadata: Metadata = { title: "Load register" };

export default async function LoadRegisterPage() {
  const actor = await requirePermission("components:read");
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-2xl font-bold">Load register</h1>
        {can(actor, "components:write") && (
          <div className="flex gap-2">
            <Link href="/load-register/import" className="rounded border border-accent bg-white px-4 py-2 font-bold text-accent">
              Import from CSV
            </Link>
            <Link href="/load-register/new" className="rounded bg-accent px-4 py-2 font-bold text-white">
              New component
            </Link>
          </div>
        )}
      </div>
      <p className="text-sm text-muted">Every component your gangs handle, with its mass and where the mass came from. Estimated masses are flagged wherever they are used.</p>
      <RegisterTable />
    </div>
  );
}
