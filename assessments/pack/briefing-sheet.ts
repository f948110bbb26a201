/**
 * The foreman's briefing sheet: large type, one block per load with the controls that matter, the
 * hazards, PPE and emergency arrangements — and, when a briefing has been held, its record.
 */
import { PDFDocument } from "pdf-lib";
import type { BriefingScript } from "../briefing/instructions";
import { PACK_CAUTION } from "./document";
import { LINE_CAUTION } from "../method-statement/lineside";
import type { PackFonts } from "./fonts";
import { embedPng } from "./images";
import { COLOURS, Writer } from "./layout";
import { ukDateTime } from "@/lib/dates";

export interface BriefingSheetInput {
  title: string;
  jobName: string;
  revisionNumber: number;
  script: BriefingScript;
  siteChanges: { text: string; by: string; at: string }[];
  record?: {
    place: string;
    startedAt: Date;
    foremanName: string;
    attendees: { name: string; employer: string; cardNumber: string; signedAt: Date; signature: Uint8Array }[];
  };
}

export async function buildBriefingSheet(input: BriefingSheetInput, fonts: PackFonts): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  doc.setTitle(`Briefing sheet: ${input.title}`);
  doc.setCreator("Heftwise");
  const w = new Writer(doc, fonts);
  const big = { size: 14 };
  w.heading(`Briefing: ${input.title}`, 1);
  w.text(`${input.jobName} · revision ${input.revisionNumber}`, { size: 13, color: COLOURS.muted });
  for (const change of input.siteChanges)
    w.text(`SITE CHANGE reported by ${change.by}: ${change.text}`, {
      size: 14,
      font: fonts.bold,
      color: COLOURS.band.act,
    });
  const line = input.script.line;
  if (line) {
    w.heading("Safe from trains");
    w.text(line.where, { size: 12, color: COLOURS.muted });
    if (line.protection) w.text(line.protection, { size: 16, font: fonts.bold });
    if (line.protectionDetail) w.text(line.protectionDetail, big);
    if (line.responsible) w.text(`Responsible: ${line.responsible}`, { size: 14, font: fonts.bold });
    if (line.positionsOfSafety)
      w.text(`Positions of safety: ${line.positionsOfSafety}`, { size: 15, font: fonts.bold });
    if (line.limits) w.text(`Limits: ${line.limits}`, big);
    if (line.accessPoint || line.walkingRoute)
      w.text(`Access: ${[line.accessPoint, line.walkingRoute].filter(Boolean).join(" — ")}`, big);
    for (const p of line.permits)
      w.text(
        `${p.name}: ${p.reference || "no reference"}${p.issuedBy ? `, issued by ${p.issuedBy}` : ""}${p.valid ? `, valid ${p.valid}` : ""}`,
        { size: 14, font: fonts.bold },
      );
    for (const d of line.digging) w.text(`- ${d}`, { ...big, indent: 10 });
    w.text(LINE_CAUTION, { size: 10, font: fonts.italic, color: COLOURS.muted });
  }
  w.heading("Sequence of work");
  input.script.sequence.forEach((s, i) => w.text(`${i + 1}. ${s}`, big));
  w.heading("Each load");
  for (const load of input.script.loads) {
    w.ensure(60);
    w.text(load.title, { size: 15, font: fonts.bold });
    const bw = w.band(load.band, undefined, w.y - 18, 12);
    w.page.drawText(w.safe(load.component), {
      x: 48 + bw + 10,
      y: w.y - 14,
      size: 12,
      font: fonts.regular,
      color: COLOURS.muted,
    });
    w.y -= 26;
    for (const line of load.lines) w.text(`- ${line}`, { ...big, indent: 10 });
    if (load.lift) for (const r of load.lift.roles) w.text(`${r.role}: ${r.name || "—"}`, { size: 12, indent: 10 });
    w.space(6);
  }
  w.heading("Hazards and controls");
  for (const h of input.script.hazards) {
    w.text(h.hazard, { size: 14, font: fonts.bold });
    for (const c of h.controls) w.text(`- ${c}`, { ...big, indent: 10 });
  }
  w.heading("PPE");
  w.text(input.script.ppe.join(" · ") || "—", big);
  w.heading("Emergency");
  w.text(`Nearest hospital (A&E): ${input.script.emergency.nearestHospital || "—"}`, { size: 14, font: fonts.bold });
  w.text(input.script.emergency.arrangements || "—", big);
  if (input.record) {
    w.newPage();
    w.heading("Briefing record");
    w.text(`Held at ${input.record.place}, ${ukDateTime(input.record.startedAt)}, by ${input.record.foremanName}.`, {
      size: 12,
    });
    for (const a of input.record.attendees) {
      const image = embedPng(doc, a.signature);
      const scale = Math.min(140 / image.width, 40 / image.height, 1);
      w.ensure(52);
      w.page.drawText(w.safe(`${a.name} (${a.employer}), card ${a.cardNumber}`), {
        x: 48,
        y: w.y - 14,
        size: 11,
        font: fonts.bold,
        color: COLOURS.ink,
      });
      w.page.drawText(`signed ${ukDateTime(a.signedAt)}`, {
        x: 48,
        y: w.y - 28,
        size: 9,
        font: fonts.regular,
        color: COLOURS.muted,
      });
      w.page.drawImage(image, { x: 360, y: w.y - 44, width: image.width * scale, height: image.height * scale });
      w.y -= 50;
    }
  }
  w.finish((n, total) => [
    `Caution: ${PACK_CAUTION}`,
    w.safe(`Briefing sheet · ${input.title} · revision ${input.revisionNumber} · page ${n} of ${total}`),
  ]);
  return doc.save({ useObjectStreams: false, objectsPerTick: Infinity });
}
