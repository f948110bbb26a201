"use client";

import type { ColumnDef } from "@tanstack/react-table";
import Link from "next/link";
import { ServerTable } from "@/app/_components/server-table";
import type { Component } from "@/db/schema";

import { GRIP_LABELS as GRIP, MASS_SOURCE_LABELS as SOURCE } from "@/assessments/load-register/schemas";

const columns: ColumnDef<Component, unknown>[] = [
  {
    id: "name",
    header: "Component",
    cell: ({ row }) => (
      <Link href={`/load-register/${row.original.id}`} className="font-bold text-accent underline">
        {row.original.name}
      </Link>
    ),
  },
  { id: "massKg", header: "Mass (kg)", cell: ({ row }) => <span className="tabular-nums">{row.original.massKg}</span> },
  {
    id: "size",
    header: "L × W × H (mm)",
    cell: ({ row }) => {
      const c = row.original;
      return (
        <span className="tabular-nums">
          {c.lengthMm && c.widthMm && c.heightMm ? `${c.lengthMm} × ${c.widthMm} × ${c.heightMm}` : "—"}
        </span>
      );
    },
  },
  { id: "grip", header: "Grip", cell: ({ row }) => GRIP[row.original.grip] },
  {
    id: "massSource",
    header: "Mass from",
    cell: ({ row }) =>
      row.original.massSource === "estimated" ? (
        <span className="rounded bg-band-watch px-2 py-0.5 font-bold text-white">Estimated — confirm</span>
      ) : (
        SOURCE[row.original.massSource]
      ),
  },
  { id: "notes", header: "Notes", cell: ({ row }) => <span className="text-muted">{row.original.notes ?? ""}</span> },
];

export function RegisterTable() {
  return (
    <ServerTable<Component>
      endpoint="/api/v1/components"
      columns={columns}
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
