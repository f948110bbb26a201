/** Uploads read in one place: the file part of a form, and its type read from its content. */
import { describe, expect, it } from "vitest";
import { formFile } from "@/lib/api";
import { AppError } from "@/lib/errors";
import { requireFileType } from "@/lib/files";
import { drawnSignaturePng } from "@/lib/png";

describe("formFile", () => {
  it("gives the chosen file's name and bytes; nothing when no file was chosen", async () => {
    const form = new FormData();
    form.set("file", new File([new Uint8Array([1, 2, 3])], "sheet.pdf"));
    form.set("none", new File([], ""));
    form.set("text", "not a file");
    form.set("empty", new File([], "empty.pdf"));
    const file = await formFile(form, "file");
    expect(file?.name).toBe("sheet.pdf");
    expect([...file!.data]).toEqual([1, 2, 3]);
    expect(await formFile(form, "none")).toBeUndefined();
    expect(await formFile(form, "text")).toBeUndefined();
    expect(await formFile(form, "missing")).toBeUndefined();
    // An empty file with a name was chosen: the caller refuses it as empty, by name.
    expect((await formFile(form, "empty"))?.data.byteLength).toBe(0);
  });
});

describe("requireFileType", () => {
  it("reads the type from the content, whatever the file is called", async () => {
    expect(await requireFileType(new Uint8Array(drawnSignaturePng(1)), ["image/png"], "Attach a picture")).toEqual({
      mime: "image/png",
      ext: "png",
    });
    const pdf = new TextEncoder().encode("%PDF-1.7\n1 0 obj\n<<>>\nendobj\ntrailer\n<<>>\n%%EOF\n");
    expect((await requireFileType(pdf, ["application/pdf"], "Attach a PDF")).mime).toBe("application/pdf");
  });

  it("refuses another type, or an unknown one, with 415 and says what the file is", async () => {
    const png = new Uint8Array(drawnSignaturePng(1));
    const refusedPng = await requireFileType(png, ["application/pdf"], "Attach a PDF").catch((e: unknown) => e);
    expect(refusedPng).toBeInstanceOf(AppError);
    expect((refusedPng as AppError).status).toBe(415);
    expect((refusedPng as AppError).message).toBe("Attach a PDF; this file is image/png");
    const unknown = await requireFileType(
      new TextEncoder().encode("just some text"),
      ["image/png"],
      "Attach a picture",
    ).catch((e: unknown) => e);
    expect((unknown as AppError).message).toBe("Attach a picture; this file is of an unknown type");
  });
});
