/**
 * A small flowing-text layout for the pack's PDFs: headings, wrapped paragraphs, key–value rows,
 * tables, band markers, page breaks, and a footer stamped on every page at the end.
 */
import { rgb, type PDFDocument, type RGB } from "pdf-lib";
import type { Band } from "../rules/types";
import { PackResources, PageCanvas } from "./canvas";
import type { PackFont, PackFonts } from "./fonts";

export const A4 = { width: 595.28, height: 841.89 };
export const MARGIN = 48;
const FOOTER_SPACE = 56;

export const COLOURS = {
  ink: rgb(0.09, 0.125, 0.11),
  muted: rgb(0.29, 0.35, 0.33),
  rule: rgb(0.84, 0.82, 0.78),
  frame: rgb(0.086, 0.188, 0.169),
  paper: rgb(0.965, 0.957, 0.933),
  band: {
    clear: rgb(0.059, 0.463, 0.431),
    watch: rgb(0.541, 0.353, 0.043),
    act: rgb(0.722, 0.227, 0.043),
    stop: rgb(0.106, 0.106, 0.106),
  } satisfies Record<Band, RGB>,
};

/** Characters outside the shipped fonts' Latin set, written the long way rather than dropped. */
const REPLACEMENTS: Record<string, string> = {
  β: "beta ",
  "≤": "<=",
  "≥": ">=",
  "→": "->",
  "←": "<-",
  "✕": "x",
  "•": "-",
  "▲": "",
  "▼": "",
  "\u2212": "-",
  "\u00a0": " ",
};

export class Writer {
  page!: PageCanvas;
  y = 0;
  readonly pages: PageCanvas[] = [];
  private readonly resources: PackResources;

  constructor(
    readonly doc: PDFDocument,
    readonly fonts: PackFonts,
  ) {
    this.resources = new PackResources(doc, fonts);
    this.newPage();
  }

  get width() {
    return A4.width - 2 * MARGIN;
  }

  /** Text the fonts can draw: known replacements, and "?" for anything else. */
  safe(text: string): string {
    if (this.fonts.regular.canDraw(text)) return text;
    let out = "";
    for (const ch of text) {
      if (REPLACEMENTS[ch] !== undefined) out += REPLACEMENTS[ch];
      else if (ch === "\n" || this.fonts.regular.canDraw(ch)) out += ch;
      else out += "?";
    }
    return out;
  }

  newPage() {
    this.page = new PageCanvas(this.doc.addPage([A4.width, A4.height]), this.resources);
    this.pages.push(this.page);
    this.y = A4.height - MARGIN;
  }

  ensure(height: number) {
    if (this.y - height < MARGIN + FOOTER_SPACE) this.newPage();
  }

  space(h = 8) {
    this.y -= h;
  }

  lines(text: string, font: PackFont, size: number, width = this.width): string[] {
    const out: string[] = [];
    const space = font.widthOfTextAtSize(" ", size);
    for (const paragraph of this.safe(text).split("\n")) {
      // Widths add up (no kerning), so each word is measured once.
      let line = "";
      let lineWidth = 0;
      const place = (word: string, wordWidth: number) => {
        if (!line || lineWidth + space + wordWidth <= width) {
          lineWidth = line ? lineWidth + space + wordWidth : wordWidth;
          line = line ? `${line} ${word}` : word;
        } else {
          out.push(line);
          line = word;
          lineWidth = wordWidth;
        }
      };
      for (const word of paragraph.split(/\s+/)) {
        if (!word) continue;
        const wordWidth = font.widthOfTextAtSize(word, size);
        if (wordWidth <= width) place(word, wordWidth);
        // A word wider than the line (a content hash, a long reference) is cut into pieces that fit.
        else for (const piece of this.cut(word, font, size, width)) place(piece, font.widthOfTextAtSize(piece, size));
      }
      out.push(line);
    }
    return out;
  }

  private cut(word: string, font: PackFont, size: number, width: number): string[] {
    const pieces: string[] = [];
    let piece = "";
    for (const ch of word) {
      if (piece && font.widthOfTextAtSize(piece + ch, size) > width) {
        pieces.push(piece);
        piece = "";
      }
      piece += ch;
    }
    pieces.push(piece);
    return pieces;
  }

  text(
    text: string,
    {
      size = 10,
      font = this.fonts.regular,
      color = COLOURS.ink,
      indent = 0,
      gap = 3,
    }: { size?: number; font?: PackFont; color?: RGB; indent?: number; gap?: number } = {},
  ) {
    for (const line of this.lines(text, font, size, this.width - indent)) {
      this.ensure(size + gap);
      this.y -= size;
      this.page.drawText(line, { x: MARGIN + indent, y: this.y, size, font, color });
      this.y -= gap;
    }
  }

  /** A heading, kept on one page with at least `keepWith` points of what follows it. */
  heading(text: string, level: 1 | 2 | 3 = 2, keepWith = 40) {
    const size = level === 1 ? 20 : level === 2 ? 14 : 11.5;
    this.ensure(size + 16 + keepWith);
    this.space(level === 1 ? 4 : 10);
    this.text(text, { size, font: this.fonts.bold, gap: 6 });
    if (level < 3) {
      this.page.drawLine({
        start: { x: MARGIN, y: this.y + 2 },
        end: { x: MARGIN + this.width, y: this.y + 2 },
        thickness: 0.8,
        color: COLOURS.rule,
      });
      this.space(6);
    }
  }

  /** Rows of label and value in two columns. */
  pairs(rows: [string, string][], labelWidth = 150) {
    for (const [label, value] of rows) {
      const labelLines = this.lines(label, this.fonts.bold, 9.5, labelWidth - 10);
      const valueLines = this.lines(value, this.fonts.regular, 10, this.width - labelWidth);
      const count = Math.max(labelLines.length, valueLines.length);
      this.ensure(13 * count);
      const top = this.y;
      labelLines.forEach((line, i) =>
        this.page.drawText(line, {
          x: MARGIN,
          y: top - 10 - i * 13,
          size: 9.5,
          font: this.fonts.bold,
          color: COLOURS.muted,
        }),
      );
      valueLines.forEach((line, i) =>
        this.page.drawText(line, {
          x: MARGIN + labelWidth,
          y: top - 10 - i * 13,
          size: 10,
          font: this.fonts.regular,
          color: COLOURS.ink,
        }),
      );
      this.y = top - 13 * count - 2;
    }
  }

  /** A simple table; columns share the width by the given fractions. */
  table(head: string[], rows: string[][], fractions: number[]) {
    const widths = fractions.map((f) => f * this.width);
    const drawRow = (cells: string[], bold: boolean) => {
      const wrapped = cells.map((c, i) => this.lines(c, bold ? this.fonts.bold : this.fonts.regular, 9, widths[i] - 6));
      const height = Math.max(...wrapped.map((w) => w.length)) * 11.5 + 5;
      this.ensure(height);
      let x = MARGIN;
      if (bold)
        this.page.drawRectangle({ x: MARGIN, y: this.y - height, width: this.width, height, color: COLOURS.paper });
      wrapped.forEach((lines, i) => {
        lines.forEach((line, j) =>
          this.page.drawText(line, {
            x: x + 3,
            y: this.y - 11 - j * 11.5,
            size: 9,
            font: bold ? this.fonts.bold : this.fonts.regular,
            color: COLOURS.ink,
          }),
        );
        x += widths[i];
      });
      this.y -= height;
      this.page.drawLine({
        start: { x: MARGIN, y: this.y },
        end: { x: MARGIN + this.width, y: this.y },
        thickness: 0.5,
        color: COLOURS.rule,
      });
    };
    drawRow(head, true);
    for (const row of rows) drawRow(row, false);
    this.space(6);
  }

  /** The band marker: the word on its colour, the Stop band hatched. */
  band(band: Band | null, x = MARGIN, y = this.y - 14, size = 10) {
    const label = band ? band.toUpperCase() : "NOT SCORED";
    const width = this.fonts.bold.widthOfTextAtSize(label, size) + 12;
    const height = size + 6;
    if (band) {
      this.page.drawRectangle({ x, y, width, height, color: COLOURS.band[band] });
      if (band === "stop")
        for (let hx = x - height; hx < x + width; hx += 6)
          this.page.drawLine({
            start: { x: Math.max(x, hx), y: y + Math.max(0, x - hx) },
            end: { x: Math.min(x + width, hx + height), y: y + Math.min(height, x + width - hx) },
            thickness: 1.2,
            color: rgb(0.3, 0.3, 0.3),
          });
      this.page.drawText(label, { x: x + 6, y: y + 4, size, font: this.fonts.bold, color: rgb(1, 1, 1) });
    } else {
      this.page.drawRectangle({ x, y, width, height, borderColor: COLOURS.muted, borderWidth: 0.8 });
      this.page.drawText(label, { x: x + 6, y: y + 4, size, font: this.fonts.bold, color: COLOURS.muted });
    }
    return width;
  }

  /**
   * Ends the document: stamps the footer on every page (caution, revision, content hash, page n of
   * N) and writes each page's content into the PDF.
   */
  finish(footer: (pageNumber: number, pageCount: number) => string[]) {
    this.pages.forEach((page, i) => {
      const wrapped = footer(i + 1, this.pages.length).flatMap((t) => this.lines(t, this.fonts.regular, 7, this.width));
      const top = MARGIN + 8 + wrapped.length * 9;
      page.drawLine({
        start: { x: MARGIN, y: top + 4 },
        end: { x: A4.width - MARGIN, y: top + 4 },
        thickness: 0.6,
        color: COLOURS.rule,
      });
      wrapped.forEach((line, j) =>
        page.drawText(line, { x: MARGIN, y: top - 7 - j * 9, size: 7, font: this.fonts.regular, color: COLOURS.muted }),
      );
      page.finish();
    });
  }
}
