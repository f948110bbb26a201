"use client";

import { useState } from "react";
import { FormMessage, PrimaryButton } from "@/app/_components/form";
import { apiRequest, messageOf } from "@/lib/api-client";

export function ForemenForm({
  jobId,
  foremen,
}: {
  jobId: string;
  foremen: { id: string; name: string; assigned: boolean }[];
}) {
  const [chosen, setChosen] = useState(new Set(foremen.filter((f) => f.assigned).map((f) => f.id)));
  const [outcome, setOutcome] = useState<{ tone: "error" | "success"; text: string } | null>(null);
  const save = async () => {
    try {
      await apiRequest(`/api/v1/jobs/${jobId}/foremen`, { method: "PUT", json: { foremanIds: [...chosen] } });
      setOutcome({ tone: "success", text: "Foremen saved." });
    } catch (err) {
      setOutcome({ tone: "error", text: messageOf(err) });
    }
  };
  return (
    <section aria-labelledby="foremen-heading" className="space-y-3 rounded-lg border border-rule bg-white p-4">
      <h2 id="foremen-heading" className="text-lg font-bold">
        Foremen on this job
      </h2>
      <p className="text-sm text-muted">They see the job&apos;s approved assessments and brief the gang from them.</p>
      {foremen.length === 0 && <p className="text-muted">Your organisation has no active foremen yet.</p>}
      {foremen.map((f) => (
        <label key={f.id} className="flex items-center gap-2">
          <input
            type="checkbox"
            className="h-5 w-5"
            checked={chosen.has(f.id)}
            onChange={(e) => {
              const next = new Set(chosen);
              if (e.target.checked) next.add(f.id);
              else next.delete(f.id);
              setChosen(next);
            }}
          />
          {f.name}
        </label>
      ))}
      <PrimaryButton type="button" onClick={save}>
        Save foremen
      </PrimaryButton>
      {outcome && <FormMessage tone={outcome.tone}>{outcome.text}</FormMessage>}
    </section>
  );
}
