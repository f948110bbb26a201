"use client";

/**
 * Chooses a task's component by searching the load register on the server, a few at a time: a
 * register of tens of thousands of components never travels to the phone or fills a select.
 */
import { useQuery } from "@tanstack/react-query";
import { useEffect, useState } from "react";
import type { RegisterEntry } from "@/assessments/method-statement/score-task";
import { apiRequest, messageOf } from "@/lib/api-client";

const SHOWN = 8;
const TYPING_PAUSE_MS = 200;

export const componentLabel = (c: RegisterEntry) =>
  `${c.name} — ${c.massKg} kg${c.massSource === "estimated" ? " (estimated)" : ""}`;

export function ComponentPicker({
  id,
  chosen,
  missing,
  onChoose,
}: {
  id: string;
  chosen: RegisterEntry | undefined;
  missing: boolean;
  onChoose: (entry: RegisterEntry | null) => void;
}) {
  const [text, setText] = useState("");
  const [open, setOpen] = useState(false);
  const [query, setQuery] = useState("");
  useEffect(() => {
    const timer = setTimeout(() => setQuery(text.trim()), TYPING_PAUSE_MS);
    return () => clearTimeout(timer);
  }, [text]);

  const results = useQuery({
    queryKey: ["register-search", query],
    enabled: open,
    staleTime: 30_000,
    queryFn: ({ signal }) =>
      apiRequest<{ items: RegisterEntry[]; total: number }>(
        `/api/v1/components?${new URLSearchParams({ q: query, limit: String(SHOWN), sort: "name" })}`,
        { signal },
      ),
  });

  const choose = (entry: RegisterEntry | null) => {
    onChoose(entry);
    setText("");
    setOpen(false);
  };

  return (
    <div>
      <label htmlFor={id} className="block text-sm font-bold">
        Component
      </label>
      <p className="mt-1 text-sm" data-testid="chosen-component">
        {chosen ? (
          <>
            <span className="font-bold">{componentLabel(chosen)}</span>{" "}
            <button type="button" className="text-accent underline" onClick={() => choose(null)}>
              Clear
            </button>
          </>
        ) : missing ? (
          <span className="text-danger">The chosen component is no longer in the load register: choose again.</span>
        ) : (
          <span className="text-muted">None chosen yet.</span>
        )}
      </p>
      <input
        id={id}
        type="search"
        autoComplete="off"
        placeholder={chosen ? "Search to change it…" : "Type to search the load register…"}
        value={text}
        onChange={(e) => {
          setText(e.target.value);
          setOpen(true);
        }}
        onFocus={() => setOpen(true)}
        onKeyDown={(e) => e.key === "Escape" && setOpen(false)}
        aria-controls={open ? `${id}-results` : undefined}
        className="mt-1 block w-full rounded border border-rule bg-white px-2 py-1.5"
      />
      {open && (
        <div id={`${id}-results`} className="mt-1 rounded border border-rule bg-white">
          {results.isError ? (
            <p role="alert" className="p-2 text-sm text-danger">
              {messageOf(results.error)}
            </p>
          ) : !results.data ? (
            <p role="status" className="p-2 text-sm text-muted">
              Searching…
            </p>
          ) : results.data.items.length === 0 ? (
            <p role="status" className="p-2 text-sm text-muted">
              No component in the register matches. Add it to the load register first.
            </p>
          ) : (
            <>
              <ul aria-label="Found in the load register" className="divide-y divide-rule">
                {results.data.items.map((c) => (
                  <li key={c.id}>
                    <button
                      type="button"
                      className="block w-full px-2 py-1.5 text-left hover:bg-paper focus:bg-paper"
                      onClick={() => choose(c)}
                    >
                      {componentLabel(c)}
                    </button>
                  </li>
                ))}
              </ul>
              {results.data.total > results.data.items.length && (
                <p className="border-t border-rule p-2 text-xs text-muted" role="status">
                  {results.data.items.length} of {results.data.total} shown: type more of the name to narrow it.
                </p>
              )}
            </>
          )}
        </div>
      )}
    </div>
  );
}
