import type { Metadata } from "next";
import Link from "next/link";
import { requirePermission } from "@/lib/auth/guard";
import { CsvImport } from "./csv-import";

export const metadata: Metadata = { title: "Import components" };

export default async function ImportPage() {
  await requirePermission("components:write");
  return (
    <div className="max-w-5xl space-y-4">
      <Link href="/load-register" className="font-bold text-accent underline">
        ← Load register
      </Link>
      <h1 className="text-2xl font-bold">Import components from CSV</h1>
      <p className="text-sm text-muted">
        One component a row. Every row is checked first; the import adds all rows or none.{" "}
        <a href="/api/v1/components/import/template" download className="font-bold text-accent underline">
          Download the CSV template
        </a>
        .
      </p>
      <CsvImport />
    </div>
  );
}
