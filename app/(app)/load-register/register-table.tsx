"use client";

import Link from "next/link";
import { ServerTable, type Column } from "@/app/_components/server-table";
import type { Component } from "@/db/schema";

import { GRIP_LABELS as GRIP, MASS_SOURCE_LABELS as SOURCE } from "@/assessments/load-register/schemas";

const columns: Column<Component>[] = [
  {
    id: "name",
    header: "Component",
    cell: (row) => (
      <Link href={`/load-register/${row.id}`} className="font-bold text-accent underline">
        {row.name}
      </Link>
    ),
  },
  { id: "massKg", header: "Mass (kg)", cell: (row) => <span className="tabular-nums">{row.massKg}</span> },
  {
    id: "size",
    header: "L × W × H (mm)",
    cell: (c) => (
      <span className="tabular-nums">
        {c.lengthMm && c.widthMm && c.heightMm ? `${c.lengthMm} × ${c.widthMm} × ${c.heightMm}` : "—"}
      </span>
    ),
  },
  { id: "grip", header: "Grip", cell: (row) => GRIP[row.grip] },
  {
    id: "massSource",
    header: "Mass from",
    cell: (row) =>
      row.massSource === "estimated" ? (
        <span className="rounded bg-band-watch px-2 py-0.5 font-bold text-white">Estimated — confirm</span>
      ) : (
        SOURCE[row.massSource]
      ),
  },
  { id: "notes", header: "Notes", cell: (row) => <span className="text-muted">{row.notes ?? ""}</span> },
];

export function RegisterTable() {
  return (
    <ServerTable<Component>
      endpoint="/api/v1/components"
      columns={columns}
      rowKey={(row) => row.id}
      caption="Load register"
      searchLabel="Search by name"
      emptyText="No component matches."
      defaultSort="name"
      sortKeys={{ name: ["name", "-name"], massKg: ["massKg", "-massKg"] }}
      filters={[
        {
          key: "massSource",
          label: "Mass from",
          options: Object.entries(SOURCE).map(([value, label]) => ({ value, label })),
        },
        { key: "grip", label: "Grip", options: Object.entries(GRIP).map(([value, label]) => ({ value, label })) },
      ]}
    />
  );
}
