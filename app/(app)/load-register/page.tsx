import type { Metadata } from "next";
import { requirePermission } from "@/lib/auth/guard";
import { ActionLink, PageHeader } from "@/app/_components/page-header";
import { can } from "@/lib/permissions";
import { RegisterTable } from "./register-table";

export const metadata: Metadata = { title: "Load register" };

export default async function LoadRegisterPage() {
  const actor = await requirePermission("components:read");
  return (
    <div className="space-y-4">
      <PageHeader title="Load register">
        {can(actor, "components:write") && (
          <>
            <ActionLink href="/load-register/import" secondary>
              Import from CSV
            </ActionLink>
            <ActionLink href="/load-register/new">New component</ActionLink>
          </>
        )}
      </PageHeader>
      <p className="text-sm text-muted">
        Every component your gangs handle, with its mass and where the mass came from. Estimated masses are flagged
        wherever they are used.
      </p>
      <RegisterTable />
    </div>
  );
}
