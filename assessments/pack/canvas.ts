/**
 * Drawing on a pack page: text, lines, rectangles, circles and images written straight into the
 * page's content stream, which is compressed once with Node's zlib when the page is finished.
 *
 * pdf-lib's own drawing calls build an object per operator and per number and compress with a
 * JavaScript deflate; for a pack of thousands of lines of text that was most of the time taken. The
 * option names follow pdf-lib's `drawText`, `drawLine`… so the layout reads the same.
 */
import { constants, deflateSync } from "node:zlib";
import { PDFName, type PDFDocument, type PDFPage, type PDFRef, type RGB } from "pdf-lib";
import type { PackFont, PackFonts } from "./fonts";
import type { PackImage } from "./images";

/** Numbers in content streams: two decimals are finer than a printer's dot at these sizes. */
const n = (x: number) => String(Math.round(x * 100) / 100);
const colour = (c: RGB) => `${n(c.red)} ${n(c.green)} ${n(c.blue)}`;

/** The fonts and images of one document, each under one resource name on every page that uses it. */
export class PackResources {
  private readonly fontRefs = new Map<PackFont, { name: string; ref: PDFRef }>();
  private readonly images = new Map<PackImage, string>();

  constructor(
    private readonly doc: PDFDocument,
    fonts: PackFonts,
  ) {
    Object.values(fonts).forEach((font: PackFont, i) =>
      this.fontRefs.set(font, { name: `F${i + 1}`, ref: font.embedIn(doc) }),
    );
  }

  font(font: PackFont) {
    const entry = this.fontRefs.get(font);
    if (!entry) throw new Error("font not embedded in this document");
    return entry;
  }

  imageName(image: PackImage) {
    let name = this.images.get(image);
    if (!name) {
      name = `Im${this.images.size + 1}`;
      this.images.set(image, name);
    }
    return name;
  }

  /** Writes a page's content stream and the resources it uses. */
  finish(page: PDFPage, ops: string[], fonts: Set<PackFont>, images: Set<PackImage>) {
    // Latin-1: text is written as bytes (two per glyph) in literal strings. The fastest zlib level:
    // twice as quick as the default for a file about a tenth larger.
    const content = Buffer.from(ops.join("\n"), "latin1");
    const stream = this.doc.context.stream(deflateSync(content, { level: constants.Z_BEST_SPEED }), {
      Filter: "FlateDecode",
    });
    page.node.addContentStream(this.doc.context.register(stream));
    for (const font of fonts) page.node.setFontDictionary(PDFName.of(this.font(font).name), this.font(font).ref);
    for (const image of images) page.node.setXObject(PDFName.of(this.imageName(image)), image.ref);
  }
}

// A quarter circle as a cubic Bézier: control points at this fraction of the radius.
const KAPPA = 0.5522847498;

export class PageCanvas {
  private readonly ops: string[] = [];
  private readonly fonts = new Set<PackFont>();
  private readonly images = new Set<PackImage>();
  // Font and fill colour persist in the graphics state across text objects, so each is written only
  // when it changes (shapes save and restore the state around their own colours).
  private currentFont = "";
  private currentFill = "";

  constructor(
    readonly page: PDFPage,
    private readonly resources: PackResources,
  ) {}

  getWidth() {
    return this.page.getWidth();
  }

  getHeight() {
    return this.page.getHeight();
  }

  drawText(
    text: string,
    { x, y, size, font, color }: { x: number; y: number; size: number; font: PackFont; color: RGB },
  ) {
    this.fonts.add(font);
    const selectFont = `/${this.resources.font(font).name} ${n(size)} Tf `;
    const fill = `${colour(color)} rg `;
    const state = (selectFont === this.currentFont ? "" : selectFont) + (fill === this.currentFill ? "" : fill);
    this.currentFont = selectFont;
    this.currentFill = fill;
    this.ops.push(`BT ${state}${n(x)} ${n(y)} Td (${font.encode(text)}) Tj ET`);
  }

  drawLine({
    start,
    end,
    thickness,
    color,
    dashArray,
  }: {
    start: { x: number; y: number };
    end: { x: number; y: number };
    thickness: number;
    color: RGB;
    dashArray?: number[];
  }) {
    const dash = dashArray ? `[${dashArray.map(n).join(" ")}] 0 d ` : "";
    this.ops.push(
      `q ${dash}${n(thickness)} w ${colour(color)} RG ${n(start.x)} ${n(start.y)} m ${n(end.x)} ${n(end.y)} l S Q`,
    );
  }

  drawRectangle({
    x,
    y,
    width,
    height,
    color,
    borderColor,
    borderWidth = 1,
  }: {
    x: number;
    y: number;
    width: number;
    height: number;
    color?: RGB;
    borderColor?: RGB;
    borderWidth?: number;
  }) {
    const box = `${n(x)} ${n(y)} ${n(width)} ${n(height)} re`;
    if (color) this.ops.push(`q ${colour(color)} rg ${box} f Q`);
    if (borderColor) this.ops.push(`q ${n(borderWidth)} w ${colour(borderColor)} RG ${box} S Q`);
  }

  /** A circle, filled and/or outlined; `size` is the radius, as in pdf-lib. */
  drawCircle({
    x,
    y,
    size: r,
    color,
    borderColor,
    borderWidth = 1,
  }: {
    x: number;
    y: number;
    size: number;
    color?: RGB;
    borderColor?: RGB;
    borderWidth?: number;
  }) {
    const k = r * KAPPA;
    const path =
      `${n(x + r)} ${n(y)} m ` +
      `${n(x + r)} ${n(y + k)} ${n(x + k)} ${n(y + r)} ${n(x)} ${n(y + r)} c ` +
      `${n(x - k)} ${n(y + r)} ${n(x - r)} ${n(y + k)} ${n(x - r)} ${n(y)} c ` +
      `${n(x - r)} ${n(y - k)} ${n(x - k)} ${n(y - r)} ${n(x)} ${n(y - r)} c ` +
      `${n(x + k)} ${n(y - r)} ${n(x + r)} ${n(y - k)} ${n(x + r)} ${n(y)} c`;
    if (color) this.ops.push(`q ${colour(color)} rg ${path} f Q`);
    if (borderColor) this.ops.push(`q ${n(borderWidth)} w ${colour(borderColor)} RG ${path} S Q`);
  }

  /** Many filled rectangles in one colour, as one path (a QR code's modules). */
  fillRectangles(rects: { x: number; y: number; width: number; height: number }[], color: RGB) {
    this.ops.push(
      `q ${colour(color)} rg ${rects.map((r) => `${n(r.x)} ${n(r.y)} ${n(r.width)} ${n(r.height)} re`).join(" ")} f Q`,
    );
  }

  drawImage(image: PackImage, { x, y, width, height }: { x: number; y: number; width: number; height: number }) {
    this.images.add(image);
    this.ops.push(`q ${n(width)} 0 0 ${n(height)} ${n(x)} ${n(y)} cm /${this.resources.imageName(image)} Do Q`);
  }

  finish() {
    this.resources.finish(this.page, this.ops, this.fonts, this.images);
  }
}
