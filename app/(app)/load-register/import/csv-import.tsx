"use client";

import Link from "next/link";
import { useState } from "react";
import { FormMessage, PrimaryButton } from "@/app/_components/form";
import { apiRequest, messageOf } from "@/lib/api-client";

interface Row {
  line: number;
  values: Record<string, string>;
  errors: { path: string; message: string }[];
  notes: { path: string; message: string }[];
}

interface Preview {
  rows: Row[];
  problems: string[];
}

export function CsvImport() {
  const [csv, setCsv] = useState<string | null>(null);
  const [fileName, setFileName] = useState("");
  const [preview, setPreview] = useState<Preview | null>(null);
  const [outcome, setOutcome] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  const choose = async (file: File | undefined) => {
    setPreview(null);
    setOutcome(null);
    if (!file) return;
    const text = await file.text();
    setCsv(text);
    setFileName(file.name);
    setBusy(true);
    try {
      setPreview(
        await apiRequest<Preview>("/api/v1/components/import?dryRun=1", { body: text, contentType: "text/csv" }),
      );
    } catch (err) {
      setOutcome({ tone: "error", text: messageOf(err) });
    } finally {
      setBusy(false);
    }
  };

  const errorCount = preview ? preview.problems.length + preview.rows.filter((r) => r.errors.length).length : 0;

  const runImport = async () => {
    if (!csv) return;
    setBusy(true);
    try {
      const body = await apiRequest<{ imported: number }>("/api/v1/components/import", {
        body: csv,
        contentType: "text/csv",
      });
      setOutcome({ tone: "success", text: `${body.imported} component${body.imported === 1 ? "" : "s"} imported.` });
      setPreview(null);
      setCsv(null);
    } catch (err) {
      setOutcome({ tone: "error", text: `Nothing was imported: ${messageOf(err)}` });
    } finally {
      setBusy(false);
    }
  };

  return (
    <div className="space-y-4">
      <label className="block rounded-lg border border-dashed border-rule bg-white p-4 font-bold">
        CSV file
        <input
          type="file"
          accept=".csv,text/csv"
          className="mt-2 block font-normal"
          onChange={(e) => void choose(e.target.files?.[0])}
        />
      </label>
      {busy && <p role="status">Checking…</p>}
      {outcome && (
        <FormMessage tone={outcome.tone}>
          {outcome.text}{" "}
          {outcome.tone === "success" && (
            <Link href="/load-register" className="font-bold underline">
              See the load register
            </Link>
          )}
        </FormMessage>
      )}
      {preview && (
        <section aria-label="Preview" className="space-y-3">
          {preview.problems.map((p) => (
            <FormMessage key={p} tone="error">
              {p}
            </FormMessage>
          ))}
          <p data-testid="import-summary">
            {fileName}: {preview.rows.length} row{preview.rows.length === 1 ? "" : "s"},{" "}
            {errorCount === 0 ? (
              "all ready to import."
            ) : (
              <strong className="text-danger">{errorCount} with problems — fix the file and choose it again.</strong>
            )}
          </p>
          <div className="overflow-x-auto rounded-lg border border-rule bg-white">
            <table className="w-full text-left text-sm">
              <thead className="bg-paper">
                <tr>
                  {["Line", "Name", "Mass (kg)", "Grip", "Mass from", "Problems"].map((h) => (
                    <th key={h} className="px-3 py-2">
                      {h}
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {preview.rows.map((r) => (
                  <tr key={r.line} className={`border-t border-rule ${r.errors.length ? "bg-red-50" : ""}`}>
                    <td className="px-3 py-2 tabular-nums">{r.line}</td>
                    <td className="px-3 py-2">{r.values.name}</td>
                    <td className="px-3 py-2 tabular-nums">{r.values.mass_kg}</td>
                    <td className="px-3 py-2">{r.values.grip}</td>
                    <td className="px-3 py-2">{r.values.mass_source}</td>
                    <td className="px-3 py-2">
                      {r.errors.map((e) => (
                        <div key={e.path + e.message} className="text-danger">
                          {e.path}: {e.message}
                        </div>
                      ))}
                      {r.notes.map((e) => (
                        <div key={e.path + e.message} className="text-muted" data-testid="import-note">
                          Note — {e.path} {e.message}
                        </div>
                      ))}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <PrimaryButton
            type="button"
            disabled={busy || errorCount > 0 || preview.rows.length === 0}
            onClick={runImport}
          >
            Import {preview.rows.length} component{preview.rows.length === 1 ? "" : "s"}
          </PrimaryButton>
        </section>
      )}
    </div>
  );
}
