import { createHash } from "node:crypto";

/** SHA-256 as lowercase hex: how Heftwise stores one-time tokens and fingerprints files. */
export const sha256Hex = (data: string | Uint8Array) => createHash("sha256").update(data).digest("hex");
