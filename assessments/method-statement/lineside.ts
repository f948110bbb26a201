/**
 * The lineside sections as label–value rows, and their caution: one wording for the read-only
 * revision, the approver's review and the pack.
 */
import { ukDate } from "@/lib/dates";
import { fmt } from "../rules/format";
import type { Content } from "./content";
import { NEAR_LINE_LABELS, PERMIT_LABELS, PROTECTION_LABELS, SUPPORT_LABELS } from "./options";

export const LINE_CAUTION =
  "Heftwise records the arrangements for working near the line; it does not plan protection from trains. That follows the infrastructure manager's rules and is done by its competent people.";

type Rows = [string, string][];

/** Working near the line; null when the work is not on or near it. */
export function lineRows(content: Content): Rows | null {
  const l = content.lineside;
  if (l.nearLine === "not-near") return null;
  return [
    ["Where", NEAR_LINE_LABELS[l.nearLine]],
    ["Protection arrangement", l.protection ? PROTECTION_LABELS[l.protection] : "— not chosen"],
    ["Details", l.protectionDetail || "—"],
    [
      "Responsible for the safe system of work",
      [l.responsibleName || "— not named", l.responsibleCompetence].filter(Boolean).join(", "),
    ],
    ["Planning reference", l.planningRef || "—"],
    ["Access point", l.accessPoint || "—"],
    ["Walking route", l.walkingRoute || "—"],
    ["Positions of safety", l.positionsOfSafety || "—"],
    ["Limits the gang keeps", l.limits || "—"],
  ];
}

export const permitName = (p: Content["permits"][number]) =>
  p.kind === "other" ? p.description || "Other permit" : PERMIT_LABELS[p.kind];

export function permitRows(content: Content): string[][] {
  return content.permits.map((p) => [
    permitName(p),
    p.reference || "— none",
    p.issuedBy || "—",
    p.validFrom || p.validTo
      ? `${p.validFrom ? ukDate(p.validFrom) : "…"} to ${p.validTo ? ukDate(p.validTo) : "…"}`
      : "—",
  ]);
}

export function buriedServicesRows(content: Content): Rows {
  const b = content.buriedServices;
  return [
    ["Service records", b.recordsObtained ? `obtained${b.recordsRef ? `, ${b.recordsRef}` : ""}` : "— not recorded"],
    [
      "Scan with a cable locating tool",
      b.scanned ? `by ${b.scannedBy || "—"} on ${b.scanDate ? ukDate(b.scanDate) : "—"}` : "— not recorded",
    ],
    ["Trial holes", b.trialHoles || "—"],
    ["Hand-dig within", b.handDigWithinM !== null ? `${fmt(b.handDigWithinM, 2)} m of a located service` : "—"],
    ["The rule the gang follows", b.rule || "—"],
  ];
}

/** The excavation; null when there is none. */
export function excavationRows(content: Content): Rows | null {
  const e = content.excavation;
  if (!e.present) return null;
  return [
    ["Depth", e.depthM !== null ? `${fmt(e.depthM, 2)} m` : "—"],
    ["Support", e.support ? SUPPORT_LABELS[e.support] : "— not chosen"],
    ["Support details", e.supportDetail || "—"],
    ["Edge protection", e.edgeProtection || "—"],
    ["Inspection", e.inspection || "—"],
    ["Access and egress", e.accessEgress || "—"],
    ["Lowering components", e.lowering || "—"],
  ];
}

export function environmentRows(content: Content): Rows {
  const v = content.environment;
  return [
    ["Spoil and waste", v.spoilAndWaste || "—"],
    ["Spill kit", v.spillKit || "—"],
    ["Backfill", v.backfill || "—"],
    ["Noise and dust", v.noiseAndDust || "—"],
    ["Welfare", v.welfare || "—"],
    ["Other environmental notes", content.emergency.environment || "—"],
  ];
}
