"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";

export function NewRevisionButton({ revisionId }: { revisionId: string }) {
  const router = useRouter();
  const [problem, setProblem] = useState<string | null>(null);
  const start = async () => {
    const res = await fetch(`/api/v1/revisions/${revisionId}/new-revision`, { method: "POST" });
    const body = await res.json();
    if (res.ok) router.push(`/revisions/${body.revisionId}`);
    else setProblem(body.error?.message ?? "Could not start a new revision.");
  };
  return (
    <span>
      <button type="button" onClick={start} className="font-bold text-accent underline">
        Start a new revision
      </button>
      {problem && (
        <span role="alert" className="ml-2 font-bold text-danger">
          {problem}
        </span>
      )}
    </span>
  );
}
