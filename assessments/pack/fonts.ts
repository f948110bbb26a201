/**
 * The pack's fonts, prepared once per process and reused by every PDF.
 *
 * The shipped fonts are small Latin sets (about 15 KB each compressed), so each PDF carries them
 * whole rather than a subset: glyph ids are then the font's own, the same in every document, and the
 * font objects (font program, widths, ToUnicode map) are built once by pdf-lib's own embedder into a
 * scratch context and copied into each document. Text needs no shaping (Latin, no ligatures
 * required), so each character is looked up once — glyph id and advance width — and strings are
 * assembled from that table. Kerning is not applied.
 */
import fontkit from "@pdf-lib/fontkit";
import { CustomFontEmbedder, PDFContext, PDFObjectCopier, type PDFDocument, type PDFRef } from "pdf-lib";

type FontkitFont = ReturnType<typeof fontkit.create>;

/** One byte of a glyph code inside a PDF literal string: parentheses, backslash and line ends escaped. */
const literalByte = (b: number) =>
  b === 0x28 || b === 0x29 || b === 0x5c
    ? `\\${String.fromCharCode(b)}`
    : b === 0x0a
      ? "\\n"
      : b === 0x0d
        ? "\\r"
        : String.fromCharCode(b);
/** A glyph id as the two bytes Identity-H expects. */
const glyphCode = (id: number) => literalByte(id >> 8) + literalByte(id & 0xff);

export class PackFont {
  // Glyph code and advance width (in text-space units per 1 pt) for every UTF-16 code unit, filled
  // when the font is loaded: the shipped fonts hold only characters of the Basic Multilingual Plane,
  // and a character the font lacks gets its .notdef glyph.
  private readonly codes: string[];
  private readonly widths = new Float64Array(0x10000);
  /** Matches text made only of characters this font has (and line breaks). */
  private readonly drawable: RegExp;

  private constructor(
    /** The TrueType file itself. */
    readonly ttf: Uint8Array,
    font: FontkitFont,
    /** The embedded font dictionary, in its own scratch context; copied into each document. */
    private readonly scratch: { context: PDFContext; ref: PDFRef },
  ) {
    const notdef = font.getGlyph(0);
    this.codes = new Array<string>(0x10000).fill(glyphCode(0));
    this.widths.fill(notdef.advanceWidth / font.unitsPerEm);
    for (const codePoint of font.characterSet) {
      if (codePoint > 0xffff) continue;
      const glyph = font.glyphForCodePoint(codePoint);
      this.codes[codePoint] = glyphCode(glyph.id);
      this.widths[codePoint] = glyph.advanceWidth / font.unitsPerEm;
    }
    const escape = (cp: number) => `\\u{${cp.toString(16)}}`;
    this.drawable = new RegExp(`^[\\n${font.characterSet.map(escape).join("")}]*$`, "u");
  }

  static async load(ttf: Uint8Array): Promise<PackFont> {
    const font = fontkit.create(ttf);
    // The PostScript name as the base font name: the whole font is embedded, so no subset tag.
    const embedder = await CustomFontEmbedder.for(fontkit, ttf, font.postscriptName ?? "AtkinsonHyperlegible");
    const context = PDFContext.create();
    const ref = await embedder.embedIntoContext(context);
    return new PackFont(ttf, font, { context, ref });
  }

  /** Adds the font to a document and returns its reference. */
  embedIn(doc: PDFDocument): PDFRef {
    const copy = PDFObjectCopier.for(this.scratch.context, doc.context).copy(
      this.scratch.context.lookup(this.scratch.ref)!,
    );
    return doc.context.register(copy);
  }

  /** Whether every character of the text is in the font. */
  canDraw(text: string): boolean {
    return this.drawable.test(text);
  }

  /**
   * The text as two-byte glyph ids (Identity-H), escaped for a literal string: `(…) Tj`. The result
   * holds bytes 0–255 as characters; write the content stream as Latin-1.
   */
  encode(text: string): string {
    let out = "";
    for (let i = 0; i < text.length; i++) {
      out += this.codes[text.charCodeAt(i)];
    }
    return out;
  }

  widthOfTextAtSize(text: string, size: number): number {
    let total = 0;
    for (let i = 0; i < text.length; i++) {
      total += this.widths[text.charCodeAt(i)];
    }
    return total * size;
  }
}

export interface PackFonts {
  regular: PackFont;
  bold: PackFont;
  italic: PackFont;
}
