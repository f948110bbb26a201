/** What an uploaded file is, read from its content (never from its name or the type the client sent). */
import { AppError } from "./errors";

export interface SniffedType {
  mime: string;
  ext: string;
}

/** The file's type if it is one of `accepted`; otherwise 415 with `refusal` (and what the file is). */
export async function requireFileType(
  data: Uint8Array,
  accepted: readonly string[],
  refusal: string,
): Promise<SniffedType> {
  const { fileTypeFromBuffer } = await import("file-type");
  const detected = await fileTypeFromBuffer(data);
  if (!detected || !accepted.includes(detected.mime))
    throw new AppError(
      "unsupported_media_type",
      `${refusal}; this file is ${detected ? detected.mime : "of an unknown type"}`,
    );
  return { mime: detected.mime, ext: detected.ext };
}
