import type { Metadata } from "next";
import { DataTable, EmptyState } from "@/app/_components/table";
import { GRIP_LABELS, listComponents, MASS_SOURCE_LABELS } from "@/assessments/load-register/queries";
import { requirePermission } from "@/lib/auth/guard";

export const metadata: Metadata = { title: "Load register" };

const dims = (l: number | null, w: number | null, h: number | null) => (l && w && h ? `${l} × ${w} × ${h}` : "—");

export default async function LoadRegisterPage() {
  const actor = await requirePermission("components:read");
  const rows = await listComponents(actor);
  return (
    <div className="space-y-4">
      <h1 className="text-2xl font-bold">Load register</h1>
      <p className="text-sm text-muted">Every component your gangs handle, with its mass and where the mass came from. Estimated masses are flagged wherever they are used.</p>
      {rows.length === 0 ? (
        <EmptyState>The load register is empty.</EmptyState>
      ) : (
        <DataTable head={["Component", "Mass (kg)", "Size L × W × H (mm)", "Grip", "Mass from", "Notes"]} caption="Load register">
          {rows.map((c) => (
            <tr key={c.id} className="border-t border-rule align-top">
              <td className="px-3 py-2 font-bold">{c.name}</td>
              <td className="px-3 py-2 tabular-nums">{c.massKg}</td>
              <td className="px-3 py-2 tabular-nums">{dims(c.lengthMm, c.widthMm, c.heightMm)}</td>
              <td className="px-3 py-2">{GRIP_LABELS[c.grip]}</td>
              <td className="px-3 py-2">
                {c.massSource === "estimated" ? (
                  <span className="rounded bg-band-watch px-2 py-0.5 font-bold text-white">Estimated — confirm</span>
                ) : (
                  MASS_SOURCE_LABELS[c.massSource]
                )}
              </td>
              <td className="px-3 py-2 text-muted">{c.notes ?? ""}</td>
            </tr>
          ))}
        </DataTable>
      )}
    </div>
  );
}
