/**
 * The assessment pack as a PDF (pdf-lib, the fonts shipped in fonts/): cover, summary of bands,
 * each task's inputs, factors, limit, index, band, reasons and sources, lift plans with the sling
 * drawn, the method statement, the hazard register, signatures — and on every page the safety
 * caution, the revision, its content hash and the page number.
 */
import { PDFDocument, PDFName, PDFString, rgb } from "pdf-lib";
import { sentLater } from "../briefing/schemas";
import QRCode from "qrcode";
import type { LiftResult } from "../lift-plan/lift";
import { HITCH_LABELS, SINGLE_SLING_HITCHES } from "../lift-plan/sling";
import { GROUND_TYPES } from "../lift-plan/ground";
import { DURATION_LABELS } from "../rules/niosh-frequency";
import { CONDITION_TEXT } from "../rules/conditions";
import { gradientText, SURFACE_LABELS } from "../rules/push";
import type { Content } from "../method-statement/content";
import { CONTROL_LEVEL_LABELS, NEAR_LINE_LABELS, OPERATION_LABELS, riskRating } from "../method-statement/options";
import {
  buriedServicesRows,
  environmentRows,
  excavationRows,
  LINE_CAUTION,
  lineRows,
  permitRows,
} from "../method-statement/lineside";
import type { TaskScore } from "../method-statement/score-task";
import { whatIfLines } from "../method-statement/what-if";
import { fmt } from "../rules/format";
import { worstBand } from "../rules/bands";
import type { Band, Reason, Warning } from "../rules/types";
import type { PackFonts } from "./fonts";
import { embedPng } from "./images";
import { COLOURS, MARGIN, Writer } from "./layout";
import type { SigningRecordEntry } from "../revisions/signing-record";
import { ukDate, ukDateTime } from "@/lib/dates";

export const PACK_CAUTION =
  "Heftwise supports, and does not replace, the judgement of a competent person. Check every result on site, and follow local regulations, your organisation's procedures and licensed practice.";

export interface PackInput {
  organisation: string;
  /** The organisation's logo for the cover (PNG or JPEG), when it has one. */
  logo: { data: Uint8Array; type: string } | null;
  /** Each event of the revision's life from the audit trail, in order (assessments/revisions/signing-record.ts). */
  signingRecord: SigningRecordEntry[];
  title: string;
  job: {
    name: string;
    client: string;
    location: string;
    lineReference: string | null;
    mileage: string | null;
    accessPoint: string | null;
    siteContactName: string | null;
    siteContactPhone: string | null;
  };
  revision: {
    id: string;
    number: number;
    status: string;
    authorName: string | null;
    approverName: string | null;
    submittedAt: Date | null;
    approvedAt: Date | null;
    reviewDate: string | null;
    contentHash: string;
  };
  content: Content;
  scores: TaskScore[];
  componentNames: Record<string, string>;
  signatures: { name: string; role: string; signedAt: Date; png: Uint8Array }[];
  /** Briefings held against this revision and signed off, with who signed on. */
  briefings: {
    place: string;
    startedAt: Date;
    completedAt: Date;
    foremanName: string;
    foremanSignature: Uint8Array | null;
    /** When the server received it: later than the start when the phone had no signal. */
    receivedAt?: Date;
    /** Taken from this revision after it had been superseded (the phone was offline). */
    againstSuperseded?: boolean;
    attendees: { name: string; employer: string; cardNumber: string; signedAt: Date; png: Uint8Array }[];
  }[];
  /** The public check page; printed on the cover with a QR code of it. */
  verifyUrl: string;
}

/** Dates in the pack as on site: day-month-year, 24-hour UK time. */
const date = (d: Date | null | undefined) => ukDateTime(d);

/** Builds the pack; the caller saves it (and signs it, for an approved revision). */
export async function buildPack(input: PackInput, fonts: PackFonts): Promise<PDFDocument> {
  const doc = await PDFDocument.create();
  const w = new Writer(doc, fonts);
  const { content, scores, revision } = input;

  doc.setTitle(`${input.title} — revision ${revision.number}`);
  doc.setAuthor(revision.authorName ?? input.organisation);
  doc.setSubject(`Manual-handling and lift-plan assessment, ${input.job.name}`);
  doc.setCreator("Heftwise");
  doc.setProducer("Heftwise");
  doc.setCreationDate(revision.approvedAt ?? revision.submittedAt ?? new Date(0));
  doc.setModificationDate(revision.approvedAt ?? revision.submittedAt ?? new Date(0));
  // A plain (uncompressed) entry, so /verify can name the revision even in an altered copy.
  // pdf-lib keeps the Info dictionary private; its trailer reference is public.
  const info = doc.context.lookup(doc.context.trailerInfo.Info);
  (info as import("pdf-lib").PDFDict).set(
    PDFName.of("HeftwiseRevision"),
    PDFString.of(`heftwise-revision:${revision.id}`),
  );

  // Cover
  w.page.drawRectangle({
    x: 0,
    y: w.page.getHeight() - 70,
    width: w.page.getWidth(),
    height: 70,
    color: COLOURS.frame,
  });
  w.page.drawText("Heftwise", {
    x: MARGIN,
    y: w.page.getHeight() - 44,
    size: 20,
    font: fonts.bold,
    color: rgb(0.953, 0.937, 0.894),
  });
  w.page.drawText(w.safe(input.organisation), {
    x: MARGIN + 120,
    y: w.page.getHeight() - 42,
    size: 11,
    font: fonts.regular,
    color: rgb(0.953, 0.937, 0.894),
  });
  if (input.logo) {
    const logo =
      input.logo.type === "image/png" ? await doc.embedPng(input.logo.data) : await doc.embedJpg(input.logo.data);
    const scale = Math.min(140 / logo.width, 48 / logo.height, 1);
    w.page.drawImage(logo, {
      x: w.page.getWidth() - MARGIN - logo.width * scale,
      y: w.page.getHeight() - 70 - 10 - logo.height * scale,
      width: logo.width * scale,
      height: logo.height * scale,
    });
  }
  w.y -= input.logo ? 70 : 60;
  w.heading(input.title, 1);
  w.text(
    `${revision.status === "approved" ? "Approved" : revision.status === "superseded" ? "Superseded" : "Draft for approval — not for use on site"} · revision ${revision.number}`,
    { size: 12, font: fonts.bold, color: revision.status === "approved" ? COLOURS.band.clear : COLOURS.band.act },
  );
  w.space(6);
  w.pairs([
    ["Job", input.job.name],
    ["Client", input.job.client],
    ["Location", input.job.location],
    ...(input.job.lineReference
      ? ([["Line and mileage", [input.job.lineReference, input.job.mileage].filter(Boolean).join(", ")]] as [
          string,
          string,
        ][])
      : []),
    ["Access point", input.job.accessPoint ?? "—"],
    ["Site contact", [input.job.siteContactName, input.job.siteContactPhone].filter(Boolean).join(", ") || "—"],
    ["Author", revision.authorName ?? "—"],
    ["Approver", revision.approverName ?? "—"],
    ["Submitted", date(revision.submittedAt)],
    ["Approved", date(revision.approvedAt)],
    ["Review by", ukDate(revision.reviewDate)],
    ["Content hash (SHA-256)", revision.contentHash],
  ]);
  w.space(8);
  const worst = worstBand(scores.map((s) => s.band).filter((b): b is Band => b !== null));
  w.ensure(30);
  w.page.drawText("Worst band of the tasks:", {
    x: MARGIN,
    y: w.y - 12,
    size: 11,
    font: fonts.bold,
    color: COLOURS.ink,
  });
  w.band(scores.some((s) => s.band) ? worst : null, MARGIN + 140, w.y - 16, 11);
  w.y -= 30;
  w.ensure(130);
  w.page.fillRectangles(qrModules(input.verifyUrl, MARGIN, w.y - 110, 110), COLOURS.ink);
  w.page.drawText("Check this document", {
    x: MARGIN + 124,
    y: w.y - 30,
    size: 11,
    font: fonts.bold,
    color: COLOURS.ink,
  });
  w.page.drawText(w.safe(input.verifyUrl), {
    x: MARGIN + 124,
    y: w.y - 46,
    size: 9.5,
    font: fonts.regular,
    color: COLOURS.band.clear,
  });
  w.page.drawText("Upload it there to see whether it is the approved revision, unaltered.", {
    x: MARGIN + 124,
    y: w.y - 62,
    size: 9,
    font: fonts.regular,
    color: COLOURS.muted,
  });
  w.y -= 124;
  w.text(PACK_CAUTION, { size: 10, font: fonts.italic, color: COLOURS.muted });

  // Summary of bands
  w.newPage();
  w.heading("Summary of bands");
  w.table(
    ["#", "Task", "Operation", "Component", "Load", "Band"],
    content.tasks.map((t, i) => [
      String(i + 1),
      t.description || "—",
      OPERATION_LABELS[t.operation],
      t.componentId ? (input.componentNames[t.componentId] ?? "—") : "—",
      scores[i].load !== null ? `${fmt(scores[i].load!)} kg${scores[i].estimatedMass ? " (estimated)" : ""}` : "—",
      scores[i].band ? scores[i].band!.toUpperCase() : "not scored",
    ]),
    [0.05, 0.33, 0.16, 0.26, 0.1, 0.1],
  );

  // Each task
  content.tasks.forEach((task, i) => {
    const s = scores[i];
    w.heading(`Task ${i + 1}: ${task.description || OPERATION_LABELS[task.operation]}`, 2);
    w.ensure(24);
    const bw = w.band(s.band);
    w.page.drawText(w.safe(`${OPERATION_LABELS[task.operation]} · rules version ${s.rulesVersion}`), {
      x: MARGIN + bw + 8,
      y: w.y - 11,
      size: 9.5,
      font: fonts.regular,
      color: COLOURS.muted,
    });
    w.y -= 22;
    if (s.load !== null)
      w.pairs([
        [
          "Load",
          `${fmt(s.load)} kg${task.quantity > 1 ? ` (${task.quantity} × ${input.componentNames[task.componentId!] ?? "component"})` : ""}${s.estimatedMass ? " — ESTIMATED MASS: confirm by weighing" : ""}`,
        ],
      ]);
    const { niosh, filter, push, lift } = s.results;
    if (task.conditions?.length)
      w.pairs([["Working conditions", task.conditions.map((c) => CONDITION_TEXT[c].label).join("; ")]]);
    if (niosh) {
      w.heading("Revised NIOSH Lifting Equation", 3);
      const o = niosh.inputs.origin;
      const d = niosh.inputs.destination;
      w.pairs([
        ["Hands at start (H, V, twist)", `${fmt(o.h)} cm, ${fmt(o.v)} cm, ${fmt(o.a)}°`],
        ["Hands at end (H, V, twist)", `${fmt(d.h)} cm, ${fmt(d.v)} cm, ${fmt(d.a)}°`],
        [
          "Frequency, duration, grip",
          `${fmt(niosh.inputs.frequency)}/min, ${fmt(niosh.inputs.durationHours)} h, ${niosh.inputs.coupling}`,
        ],
        [
          "Rest after, duration category",
          `${niosh.inputs.recoveryHours !== undefined ? `${fmt(niosh.inputs.recoveryHours)} h` : "not given"}; ${DURATION_LABELS[niosh.derived.durationBand]} column`,
        ],
        [
          "HM, VM, DM, AM, FM, CM",
          [niosh.origin.hm, niosh.origin.vm, niosh.origin.dm, niosh.origin.am, niosh.origin.fm, niosh.origin.cm]
            .map((x) => fmt(x, 2))
            .join(", "),
        ],
        ["RWL (limit)", niosh.li === null ? "none: outside the equation's range" : `${fmt(niosh.limit)} kg`],
        ["Lifting index", niosh.li === null ? "none: outside the equation's range" : fmt(niosh.li)],
      ]);
      reasons(w, niosh.reasons, niosh.warnings);
    }
    if (filter) {
      w.heading("Guideline weights (HSE L23)", 3);
      w.pairs([
        [
          "Figures for, zone, reach",
          `${filter.inputs.sex === "male" ? "men" : "women"}, ${filter.inputs.zone.replace(/-/g, " ")}, ${filter.inputs.reach}`,
        ],
        [
          "Frequency, twist, team",
          `${fmt(filter.inputs.frequency)}/min, ${fmt(filter.inputs.twistDeg)}°, ${filter.inputs.teamSize}`,
        ],
        ...(filter.inputs.carryDistanceM
          ? ([["Carried", `${fmt(filter.inputs.carryDistanceM)} m`]] as [string, string][])
          : []),
        [
          "Table figure, kept after reductions",
          `${fmt(filter.baseGuideline)} kg, ${fmt(filter.reductionFactor * 100, 0)} %`,
        ],
        ["Guideline (limit)", `${fmt(filter.guideline)} kg`],
        ["Index", filter.index === null ? "none: no guideline weight remains" : fmt(filter.index)],
      ]);
      reasons(w, filter.reasons, filter.warnings);
    }
    if (push) {
      w.heading("Pushing and pulling", 3);
      w.pairs([
        [
          "Mass, surface, gradient",
          `${fmt(push.inputs.mass)} kg, ${push.inputs.surface ? SURFACE_LABELS[push.inputs.surface] : "surface not stated (judged as rails)"}, ${gradientText(push.inputs.gradient)}`,
        ],
        [
          "People, brake",
          `${push.inputs.teamSize} (${push.inputs.sex === "male" ? "men's" : "women's"} figures); ${push.inputs.braked ? `braked, worked by ${push.inputs.brakeOperator || "— not named"}` : "unbraked"}`,
        ],
        ["Force to start (limit)", `${fmt(push.startForceN, 0)} N (${fmt(push.guidelineStartN, 0)} N)`],
        ["Force to keep moving (limit)", `${fmt(push.sustainedForceN, 0)} N (${fmt(push.guidelineSustainedN, 0)} N)`],
        ...(push.inputs.braked
          ? ([["Holding and stopping", "by the brake"]] as [string, string][])
          : ([
              [
                "Force to hold it on the slope (limit)",
                `${fmt(push.holdForceN, 0)} N (${fmt(push.guidelineStartN, 0)} N)`,
              ],
              ["Force to stop it (limit)", `${fmt(push.stopForceN, 0)} N (${fmt(push.guidelineStartN, 0)} N)`],
            ] as [string, string][])),
        ["Runs away if let go", push.runsAway ? "YES" : "no"],
        ["Index", fmt(push.index)],
      ]);
      reasons(w, push.reasons, push.warnings);
    }
    if (lift)
      liftSection(
        w,
        lift,
        input.content.tasks[i].lift?.exclusionZoneM,
        input.content.tasks[i].lift?.groundBearingNotes,
      );
    // From the stored snapshot: the changes the engine confirmed when the revision was scored.
    const advice = whatIfLines(s.whatIf);
    if (advice.length) {
      w.text("What would bring it to clear (each change re-scored by the same rules):", {
        size: 9.5,
        font: fonts.bold,
      });
      for (const a of advice) w.text(`- ${a}`, { size: 9.5, indent: 8 });
    }
    if (s.incomplete.length) w.text(`Incomplete: ${s.incomplete.join("; ")}.`, { size: 9.5, color: COLOURS.band.act });
  });

  // Method statement
  w.newPage();
  w.heading("Method statement");
  w.heading("Scope", 3);
  w.text(content.scope.summary || "—");
  if (content.scope.startDate || content.scope.durationShifts)
    w.text(
      `Planned start ${content.scope.startDate ? ukDate(content.scope.startDate) : "—"}; ${content.scope.durationShifts} shift(s).`,
      {
        color: COLOURS.muted,
      },
    );
  linesideSections(w, content);
  w.heading("Sequence of work", 3);
  content.sequence.forEach((s, i) => w.text(`${i + 1}. ${s.text}`, { indent: 4 }));
  w.heading("People", 3);
  w.table(
    ["Role", "Name", "Competence"],
    content.people.roles.map((r) => [r.role, r.name, r.competence]),
    [0.34, 0.33, 0.33],
  );
  w.heading("Plant and equipment", 3);
  w.text(content.people.plant.filter(Boolean).join("; ") || "—");
  w.heading("PPE", 3);
  w.text(content.people.ppe.filter(Boolean).join("; ") || "—");
  w.heading("Emergency and environment", 3);
  w.pairs([
    ["Nearest hospital (A&E)", content.emergency.nearestHospital || "—"],
    ["Arrangements", content.emergency.arrangements || "—"],
  ]);
  groundSections(w, content);
  w.heading("Environment and welfare", 3);
  w.pairs(environmentRows(content));

  // Hazard register
  w.heading("Hazard register");
  w.table(
    ["Hazard", "Who", "Before", "Controls (hierarchy of control)", "After"],
    content.hazards.map((h) => [
      h.hazard,
      h.whoIsAtRisk,
      `${h.likelihoodBefore} × ${h.severityBefore} = ${riskRating(h.likelihoodBefore, h.severityBefore)}`,
      h.controls.map((c) => `${CONTROL_LEVEL_LABELS[c.level]}: ${c.text}`).join("\n"),
      `${h.likelihoodAfter} × ${h.severityAfter} = ${riskRating(h.likelihoodAfter, h.severityAfter)}`,
    ]),
    [0.22, 0.13, 0.11, 0.43, 0.11],
  );

  // Signatures
  w.heading("Signatures", 2, 100); // with the first signature
  if (input.signatures.length === 0) w.text("Not yet countersigned.", { color: COLOURS.muted });
  for (const sig of input.signatures) {
    const image = embedPng(doc, sig.png);
    const scale = Math.min(200 / image.width, 70 / image.height, 1);
    w.ensure(100);
    w.page.drawImage(image, {
      x: MARGIN,
      y: w.y - image.height * scale - 4,
      width: image.width * scale,
      height: image.height * scale,
    });
    w.page.drawText(w.safe(`${sig.name}, ${sig.role}`), {
      x: MARGIN + 220,
      y: w.y - 20,
      size: 11,
      font: fonts.bold,
      color: COLOURS.ink,
    });
    w.page.drawText(`Countersigned ${date(sig.signedAt)}`, {
      x: MARGIN + 220,
      y: w.y - 36,
      size: 9.5,
      font: fonts.regular,
      color: COLOURS.muted,
    });
    w.y -= Math.max(image.height * scale + 14, 50);
  }

  // Briefing record
  if (input.briefings.length) {
    w.heading("Briefing record", 2, 60);
    for (const b of input.briefings) {
      w.text(`Briefed at ${b.place}, ${date(b.startedAt)}, by ${b.foremanName}; signed off ${date(b.completedAt)}.`, {
        font: fonts.bold,
      });
      if (b.receivedAt && sentLater(b.startedAt, b.receivedAt))
        w.text(`Taken on the foreman's phone without signal; received ${date(b.receivedAt)}.`);
      if (b.againstSuperseded)
        w.text(
          "Briefed from this revision after it had been superseded (the phone had no signal): reported to the adviser.",
          { font: fonts.bold },
        );
      for (const a of b.attendees) {
        const image = embedPng(doc, a.png);
        const scale = Math.min(120 / image.width, 32 / image.height, 1);
        w.ensure(40);
        w.page.drawText(w.safe(`${a.name} (${a.employer}), card ${a.cardNumber}, ${date(a.signedAt)}`), {
          x: MARGIN,
          y: w.y - 14,
          size: 9.5,
          font: fonts.regular,
          color: COLOURS.ink,
        });
        w.page.drawImage(image, {
          x: MARGIN + 360,
          y: w.y - 34,
          width: image.width * scale,
          height: image.height * scale,
        });
        w.y -= 40;
      }
      w.space(6);
    }
  }

  // Signing record: the revision's life as the audit trail holds it, to be matched against it.
  if (input.signingRecord.length) {
    w.heading("Signing record", 2, 60);
    w.text(
      "Each event of this revision's life, from Heftwise's audit trail. The number and hash name the event in the organisation's tamper-evident chain; an administrator can check the chain under Audit trail.",
      { size: 9.5, color: COLOURS.muted },
    );
    w.space(4);
    w.table(
      ["No.", "When", "Event", "Who", "How authenticated", "Content / event hash"],
      input.signingRecord.map((e) => [
        String(e.seq),
        date(e.at),
        e.event,
        e.who,
        e.how,
        `${e.contentHash ? e.contentHash.slice(0, 12) : "—"} / ${e.hash ? e.hash.slice(0, 12) : "—"}`,
      ]),
      [0.06, 0.16, 0.17, 0.14, 0.3, 0.17],
    );
  }

  w.finish((n, total) => [
    `Caution: ${PACK_CAUTION}`,
    w.safe(
      `${input.title} · revision ${revision.number} (${revision.status}) · content SHA-256 ${revision.contentHash.slice(0, 16)}… · page ${n} of ${total}`,
    ),
  ]);
  return doc;
}

/**
 * A QR code drawn as vector squares (sharp at any print size), with a one-module quiet zone inside
 * the given square. Dark modules next to each other in a row are joined into one rectangle.
 */
function qrModules(text: string, x: number, y: number, side: number) {
  const { modules } = QRCode.create(text, { errorCorrectionLevel: "M" });
  const cell = side / (modules.size + 2);
  const rects: { x: number; y: number; width: number; height: number }[] = [];
  for (let row = 0; row < modules.size; row++) {
    for (let col = 0; col < modules.size;) {
      if (!modules.get(row, col)) {
        col++;
        continue;
      }
      const start = col;
      while (col < modules.size && modules.get(row, col)) col++;
      rects.push({
        x: x + (start + 1) * cell,
        y: y + side - (row + 2) * cell,
        width: (col - start) * cell,
        height: cell,
      });
    }
  }
  return rects;
}

function reasons(w: Writer, list: Reason[], warnings: Warning[]) {
  for (const warning of warnings)
    w.text(`Warning: ${warning.message}`, { size: 9.5, color: COLOURS.band.act, indent: 4 });
  for (const r of list) {
    w.text(r.text, { size: 9.5, indent: 4, gap: 1 });
    w.text(`Source: ${r.source}`, { size: 8, color: COLOURS.muted, indent: 12 });
  }
}

/** Working near the line: told early in the method statement, as in the briefing. */
function linesideSections(w: Writer, content: Content) {
  w.heading("Working near the line", 3);
  const rows = lineRows(content);
  if (!rows) {
    w.text(NEAR_LINE_LABELS[content.lineside.nearLine]);
    return;
  }
  w.pairs(rows);
  w.text(LINE_CAUTION, { size: 9, font: w.fonts.italic, color: COLOURS.muted });
}

/** Permits, the checks before digging and the excavation. */
function groundSections(w: Writer, content: Content) {
  w.heading("Permits", 3);
  if (content.permits.length === 0) w.text("None listed.");
  else w.table(["Permit", "Reference", "Issued by", "Valid"], permitRows(content), [0.34, 0.22, 0.26, 0.18]);
  w.heading("Buried services", 3);
  w.pairs(buriedServicesRows(content));
  w.heading("Excavation", 3);
  const excavation = excavationRows(content);
  if (excavation) w.pairs(excavation);
  else w.text("No excavation.");
}

function liftSection(w: Writer, lift: LiftResult, exclusionZoneM?: number, groundNotes?: string) {
  const { fonts } = w;
  const hitch = lift.inputs.sling.hitch ?? "straight";
  const single = SINGLE_SLING_HITCHES.includes(hitch);
  w.heading(`Lift plan — category ${lift.category}`, 3);
  const people = lift.inputs.people ?? {};
  w.pairs([
    [
      "Hook load",
      `${fmt(lift.hookLoad)} kg (load ${fmt(lift.inputs.load)} + rigging ${fmt(lift.inputs.riggingMass)} + hook block ${fmt(lift.inputs.hookBlockMass)})`,
    ],
    [
      "Rated capacity, radius",
      `${fmt(lift.inputs.ratedCapacity)} kg at ${lift.inputs.radiusM !== undefined ? `${fmt(lift.inputs.radiusM, 1)} m` : "—"} (max ${lift.inputs.maxRadiusM !== undefined ? `${fmt(lift.inputs.maxRadiusM, 1)} m` : "—"})`,
    ],
    ["Utilisation", `${fmt(lift.utilisation * 100, 0)} %`],
    [
      "Sling",
      `${single ? "one sling" : `${lift.inputs.sling.legs} leg(s)`}, ${HITCH_LABELS[hitch]}, ${fmt(lift.inputs.sling.angleFromVerticalDeg, 1)}° from vertical, WLL ${fmt(lift.inputs.sling.legWll)} kg ${single ? "straight" : "per leg"}`,
    ],
    [
      "Assembly limit",
      `computed ${fmt(lift.computedSlingWll)} kg (mode factor ${fmt(lift.modeFactor)}); marked ${lift.inputs.sling.markedWll !== undefined ? `${fmt(lift.inputs.sling.markedWll)} kg` : "— not entered"}; rated ${fmt(lift.slingWll)} kg`,
    ],
    [
      "Tension, result",
      `${fmt(lift.legTension)} kg per ${single ? "part" : "leg"} — ${lift.slingOk ? "passes" : "FAILS"}`,
    ],
    ["Category because", lift.categoryReasons.join("; ")],
    ["Lift date", ukDate(lift.inputs.liftDate)],
    ...lift.examinations.map(
      (e) =>
        [`Examined: ${e.item}`, `${ukDate(e.lastExamined)}, due ${ukDate(e.dueDate)} (${e.status})`] as [
          string,
          string,
        ],
    ),
    [
      "Wind",
      lift.inputs.wind
        ? `forecast ${fmt(lift.inputs.wind.forecastMs, 1)} m/s, limit ${fmt(lift.inputs.wind.inServiceLimitMs, 1)} m/s`
        : "—",
    ],
    ["Exclusion zone", exclusionZoneM !== undefined ? `${fmt(exclusionZoneM, 1)} m radius` : "—"],
    [
      "Ground bearing",
      lift.ground
        ? `${fmt(lift.ground.pressureKpa, 0)} kPa under a ${fmt(lift.inputs.groundBearing!.matLengthM, 2)} m × ${fmt(lift.inputs.groundBearing!.matWidthM, 2)} m mat (${fmt(lift.inputs.groundBearing!.outriggerForceKn, 1)} kN); allowable ${lift.ground.allowableKpa === null ? "none: not judged" : `${fmt(lift.ground.allowableKpa, 0)} kPa (${lift.ground.allowableFrom === "entered" ? "entered" : `presumed, ${GROUND_TYPES[lift.inputs.groundBearing!.ground!].label}`})`}`
        : "— not checked",
    ],
    ["Ground notes", groundNotes || "—"],
    ...lift.accessoryChecks.map(
      (a) =>
        [
          `Accessory: ${a.item}`,
          `carries ${fmt(a.carriesKg, 0)} kg of ${fmt(a.wllKg, 0)} kg WLL — ${a.ok ? "passes" : "FAILS"}`,
        ] as [string, string],
    ),
    [
      "Appointed person",
      people.appointedPerson ? `${people.appointedPerson.name} (${people.appointedPerson.competenceRef})` : "—",
    ],
    [
      "Lift supervisor",
      people.liftSupervisor ? `${people.liftSupervisor.name} (${people.liftSupervisor.competenceRef})` : "—",
    ],
    ["Operator", people.operator ? `${people.operator.name} (${people.operator.competenceRef})` : "—"],
    [
      "Slinger/signaller",
      people.slingerSignaller ? `${people.slingerSignaller.name} (${people.slingerSignaller.competenceRef})` : "—",
    ],
  ]);
  // The sling, drawn: hook, legs at their angle, tension on each leg, the load.
  const height = 150;
  w.ensure(height + 10);
  const top = w.y - 10;
  const cx = MARGIN + w.width / 2;
  const drop = 100;
  const angle = (lift.inputs.sling.angleFromVerticalDeg * Math.PI) / 180;
  const spread = Math.tan(angle) * drop;
  const legs = lift.inputs.sling.legs;
  // A basket or endless sling: two parts, passing under the load.
  const part = Math.max(spread, 18);
  const xs = single
    ? [cx - part, cx + part]
    : legs === 1
      ? [cx]
      : legs === 2
        ? [cx - spread, cx + spread]
        : legs === 3
          ? [cx - spread, cx, cx + spread]
          : [cx - spread, cx - spread / 3, cx + spread / 3, cx + spread];
  w.page.drawCircle({ x: cx, y: top - 6, size: 4, color: COLOURS.ink });
  const colour = lift.slingOk ? COLOURS.frame : COLOURS.band.act;
  xs.forEach((x, i) => {
    w.page.drawLine({ start: { x: cx, y: top - 6 }, end: { x, y: top - 6 - drop }, thickness: 2, color: colour });
    // Every leg carries the same tension: label the outer legs only.
    if (i === 0 || i === xs.length - 1)
      w.page.drawText(`${fmt(lift.legTension, 0)} kg`, {
        x: (cx + x) / 2 + (x < cx ? -46 : 6),
        y: top - 6 - drop / 2,
        size: 9,
        font: fonts.bold,
        color: colour,
      });
  });
  if (legs > 1) {
    w.page.drawLine({
      start: { x: cx, y: top - 6 },
      end: { x: cx, y: top - 6 - drop },
      thickness: 0.6,
      color: COLOURS.muted,
      dashArray: [3, 3],
    });
    w.page.drawText(`${fmt(lift.inputs.sling.angleFromVerticalDeg, 1)}° from vertical`, {
      x: cx + 8,
      y: top - 40,
      size: 9,
      font: fonts.regular,
      color: COLOURS.band.clear,
    });
  }
  const loadWidth = Math.max(120, xs[xs.length - 1] - xs[0] + 30);
  w.page.drawRectangle({
    x: cx - loadWidth / 2,
    y: top - 6 - drop - 30,
    width: loadWidth,
    height: 30,
    color: COLOURS.band.watch,
  });
  if (single) {
    const under = top - 6 - drop - 34;
    w.page.drawLine({
      start: { x: xs[0], y: top - 6 - drop },
      end: { x: xs[0], y: under },
      thickness: 2,
      color: colour,
    });
    w.page.drawLine({ start: { x: xs[0], y: under }, end: { x: xs[1], y: under }, thickness: 2, color: colour });
    w.page.drawLine({
      start: { x: xs[1], y: under },
      end: { x: xs[1], y: top - 6 - drop },
      thickness: 2,
      color: colour,
    });
  }
  if (hitch === "choked" || hitch === "endless-choked")
    for (const x of xs) w.page.drawCircle({ x, y: top - 6 - drop - 5, size: 5, borderColor: colour, borderWidth: 1.5 });
  w.page.drawText(`${fmt(lift.slingLoad, 0)} kg`, {
    x: cx - 20,
    y: top - drop - 26,
    size: 10,
    font: fonts.bold,
    color: rgb(1, 1, 1),
  });
  w.y = top - height;
  w.text(
    `Hitch: ${HITCH_LABELS[hitch]}.${legs === 4 && !single ? " Four legs drawn; three are taken to share the load." : ""}`,
    { size: 8.5, color: COLOURS.muted },
  );
  reasons(w, lift.reasons, lift.warnings);
}
