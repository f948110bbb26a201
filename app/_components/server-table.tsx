"use client";

/**
 * A list read from the API page by page (limit/cursor), with search, filters and sorting done on
 * the server: TanStack Query fetches, and the rows arrive sorted and paged, so the table only draws
 * them, column by column (a table library's row models would only repeat, on every render of every
 * page the server draws, what the API already did).
 */
import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { useState, type ReactNode } from "react";
import { apiRequest } from "@/lib/api-client";

export interface Column<T> {
  id: string;
  header: string;
  cell: (row: T) => ReactNode;
}

export interface FilterSpec {
  key: string;
  label: string;
  options: { value: string; label: string }[];
}

interface Props<T> {
  endpoint: string;
  columns: Column<T>[];
  /** Each row's key. */
  rowKey: (row: T) => string;
  filters?: FilterSpec[];
  /** Sort keys the API accepts, by column id: `[ascending, descending]`. */
  sortKeys?: Record<string, [string, string]>;
  defaultSort?: string;
  searchLabel?: string;
  pageSize?: number;
  /** The first page as the server rendered it (no search, filters or cursor, the default sort): shown at once. */
  initialPage?: PageResponse<T>;
  emptyText: string;
  caption: string;
}

interface PageResponse<T> {
  items: T[];
  nextCursor: string | null;
  total: number;
}

export function ServerTable<T>({
  endpoint,
  columns,
  rowKey,
  filters = [],
  sortKeys = {},
  defaultSort,
  searchLabel = "Search",
  pageSize = 20,
  initialPage,
  emptyText,
  caption,
}: Props<T>) {
  const [search, setSearch] = useState("");
  const [values, setValues] = useState<Record<string, string>>({});
  const [sort, setSort] = useState(defaultSort);
  const [cursors, setCursors] = useState<(string | undefined)[]>([undefined]);
  const cursor = cursors[cursors.length - 1];

  const params = new URLSearchParams({ limit: String(pageSize) });
  if (search.trim()) params.set("q", search.trim());
  for (const [k, v] of Object.entries(values)) if (v) params.set(k, v);
  if (sort) params.set("sort", sort);
  if (cursor) params.set("cursor", cursor);

  const isFirstView = !search.trim() && !Object.values(values).some(Boolean) && sort === defaultSort && !cursor;
  const query = useQuery({
    queryKey: [endpoint, params.toString()],
    placeholderData: keepPreviousData,
    // The server rendered the first page with the HTML: no request, no empty table, no layout shift.
    initialData: isFirstView ? initialPage : undefined,
    queryFn: ({ signal }) => apiRequest<PageResponse<T>>(`${endpoint}?${params}`, { signal }),
  });

  const restart = () => setCursors([undefined]);

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end gap-3 rounded-lg border border-rule bg-white p-3">
        <label className="text-sm font-bold">
          {searchLabel}
          <input
            type="search"
            value={search}
            onChange={(e) => {
              setSearch(e.target.value);
              restart();
            }}
            className="mt-1 block w-56 rounded border border-rule px-2 py-1.5 font-normal"
          />
        </label>
        {filters.map((f) => (
          <label key={f.key} className="text-sm font-bold">
            {f.label}
            <select
              value={values[f.key] ?? ""}
              onChange={(e) => {
                setValues({ ...values, [f.key]: e.target.value });
                restart();
              }}
              className="mt-1 block w-full max-w-[16rem] rounded border border-rule bg-white px-2 py-1.5 font-normal"
            >
              <option value="">All</option>
              {f.options.map((o) => (
                <option key={o.value} value={o.value}>
                  {o.label}
                </option>
              ))}
            </select>
          </label>
        ))}
        <p className="ml-auto text-sm text-muted" role="status">
          {query.isFetching ? "Loading…" : query.data ? `${query.data.total} in all` : ""}
        </p>
      </div>
      {query.isError ? (
        <p role="alert" className="rounded border-l-4 border-danger bg-red-50 p-3 text-danger">
          {(query.error as Error).message}
        </p>
      ) : (
        <div className="overflow-x-auto rounded-lg border border-rule bg-white">
          <table className="w-full text-left text-sm">
            <caption className="sr-only">{caption}</caption>
            <thead className="bg-paper">
              <tr>
                {columns.map((column) => {
                  const keys = sortKeys[column.id];
                  const state = keys
                    ? sort === keys[0]
                      ? "ascending"
                      : sort === keys[1]
                        ? "descending"
                        : "none"
                    : undefined;
                  return (
                    <th key={column.id} scope="col" className="px-3 py-2" aria-sort={state}>
                      {keys ? (
                        <button
                          type="button"
                          className="font-bold underline decoration-dotted"
                          onClick={() => {
                            setSort(sort === keys[0] ? keys[1] : keys[0]);
                            restart();
                          }}
                        >
                          {column.header}
                          {state === "ascending" ? " ▲" : state === "descending" ? " ▼" : ""}
                        </button>
                      ) : (
                        column.header
                      )}
                    </th>
                  );
                })}
              </tr>
            </thead>
            <tbody>
              {(query.data?.items ?? []).map((row) => (
                <tr key={rowKey(row)} className="border-t border-rule align-top">
                  {columns.map((column) => (
                    <td key={column.id} className="px-3 py-2">
                      {column.cell(row)}
                    </td>
                  ))}
                </tr>
              ))}
              {query.data && query.data.items.length === 0 && (
                <tr>
                  <td colSpan={columns.length} className="px-3 py-6 text-center text-muted">
                    {emptyText}
                  </td>
                </tr>
              )}
            </tbody>
          </table>
        </div>
      )}
      <div className="flex items-center gap-3">
        <button
          type="button"
          className="rounded border border-rule bg-white px-3 py-1.5 font-bold disabled:opacity-40"
          disabled={cursors.length === 1}
          onClick={() => setCursors(cursors.slice(0, -1))}
        >
          ← Previous
        </button>
        <span className="text-sm text-muted">Page {cursors.length}</span>
        <button
          type="button"
          className="rounded border border-rule bg-white px-3 py-1.5 font-bold disabled:opacity-40"
          disabled={!query.data?.nextCursor}
          onClick={() => query.data?.nextCursor && setCursors([...cursors, query.data.nextCursor])}
        >
          Next →
        </button>
      </div>
    </div>
  );
}
