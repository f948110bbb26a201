"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { apiRequest, messageOf } from "@/lib/api-client";

export function NewRevisionButton({ revisionId }: { revisionId: string }) {
  const router = useRouter();
  const [problem, setProblem] = useState<string | null>(null);
  const start = async () => {
    try {
      const body = await apiRequest<{ revisionId: string }>(`/api/v1/revisions/${revisionId}/new-revision`, {
        method: "POST",
      });
      router.push(`/revisions/${body.revisionId}`);
    } catch (err) {
      setProblem(messageOf(err));
    }
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
