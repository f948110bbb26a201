"use client";

import Link from "next/link";
import { BandChip } from "@/app/_components/results/band";
import { ServerTable, type Column, type FilterSpec } from "@/app/_components/server-table";
import type { Band } from "@/assessments/rules/types";
import { ukDate, ukDateTime } from "@/lib/dates";

interface Row {
  revisionId: string;
  title: string;
  jobName: string;
  number: number;
  status: "draft" | "submitted" | "approved" | "superseded";
  worstBand: Band | null;
  authorName: string | null;
  reviewDate: string | null;
  updatedAt: string;
}

const STATUS = { draft: "Draft", submitted: "Submitted", approved: "Approved", superseded: "Superseded" } as const;

const columns: Column<Row>[] = [
  {
    id: "title",
    header: "Assessment",
    cell: (row) => (
      <Link href={`/revisions/${row.revisionId}`} className="font-bold text-accent underline">
        {row.title}
      </Link>
    ),
  },
  { id: "job", header: "Job", cell: (row) => row.jobName },
  { id: "number", header: "Rev.", cell: (row) => row.number },
  { id: "status", header: "Status", cell: (row) => STATUS[row.status] },
  { id: "worstBand", header: "Worst band", cell: (row) => <BandChip band={row.worstBand} /> },
  { id: "author", header: "Author", cell: (row) => row.authorName ?? "—" },
  {
    id: "reviewDate",
    header: "Review by",
    cell: (row) => {
      const { reviewDate, status } = row;
      if (!reviewDate) return "—";
      const due = status === "approved" && Date.parse(reviewDate) <= Date.now() + 30 * 86_400_000;
      if (!due) return <span className="whitespace-nowrap">{ukDate(reviewDate)}</span>;
      return (
        <>
          <span className="whitespace-nowrap">{ukDate(reviewDate)}</span>{" "}
          <span className="inline-block whitespace-nowrap rounded bg-band-watch px-1.5 py-0.5 text-xs font-bold text-white">
            Review due
          </span>
        </>
      );
    },
  },
  { id: "updatedAt", header: "Last saved", cell: (row) => ukDateTime(new Date(row.updatedAt)) },
];

export function AssessmentsTable({
  jobs,
  authors,
  firstPage,
}: {
  jobs: { id: string; name: string }[];
  authors: { id: string; name: string }[];
  /** The first 20 rows, last saved first, as the API would answer them. */
  firstPage: { items: Row[]; nextCursor: string | null; total: number };
}) {
  const filters: FilterSpec[] = [
    { key: "status", label: "Status", options: Object.entries(STATUS).map(([value, label]) => ({ value, label })) },
    { key: "jobId", label: "Job", options: jobs.map((j) => ({ value: j.id, label: j.name })) },
    {
      key: "worstBand",
      label: "Worst band",
      options: ["clear", "watch", "act", "stop"].map((b) => ({ value: b, label: b[0].toUpperCase() + b.slice(1) })),
    },
    { key: "authorId", label: "Author", options: authors.map((a) => ({ value: a.id, label: a.name })) },
    { key: "reviewDue", label: "Review", options: [{ value: "30", label: "Due within 30 days" }] },
  ];
  return (
    <ServerTable<Row>
      endpoint="/api/v1/assessments"
      columns={columns}
      rowKey={(row) => row.revisionId}
      filters={filters}
      caption="Assessments"
      searchLabel="Search titles"
      emptyText="No assessment matches."
      defaultSort="-updatedAt"
      pageSize={20}
      initialPage={firstPage}
      sortKeys={{ title: ["title", "-title"], updatedAt: ["updatedAt", "-updatedAt"] }}
    />
  );
}
