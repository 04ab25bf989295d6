import { z } from "zod";

// What signing, returning and verifying a report accept. The same schemas
// check the forms in the browser and decide on the server.

/** A drawn signature arrives as a PNG data URL; 200 KB is far more than a pen stroke needs. */
export const DRAWN_SIGNATURE_MAX_BYTES = 200 * 1024;
const PNG_DATA_URL = /^data:image\/png;base64,[A-Za-z0-9+/]+={0,2}$/;

const version = z.number({ error: "is required: the version you read" }).int().positive();

export const ZSignInput = z.object({
  version,
  password: z.string({ error: "is required: your password confirms that you sign" }).min(1, "is required: your password confirms that you sign").max(200),
  typedSignature: z
    .string({ error: "is required: type your name as you sign" })
    .trim()
    .min(2, "is required: type your name as you sign")
    .max(80, "must be at most 80 characters"),
  drawnSignature: z
    .string()
    .regex(PNG_DATA_URL, "must be a PNG image drawn on the signature pad")
    .refine((v) => Math.floor(((v.length - v.indexOf(",") - 1) * 3) / 4) <= DRAWN_SIGNATURE_MAX_BYTES, "is too large: draw it again, smaller")
    .optional(),
});
export type TSignInput = z.infer<typeof ZSignInput>;

export const ZReturnInput = z.object({
  version,
  comments: z
    .string({ error: "are required: say what the officer must change" })
    .trim()
    .min(10, "are required: say what the officer must change (at least 10 characters)")
    .max(4000, "must be at most 4 000 characters"),
});
export type TReturnInput = z.infer<typeof ZReturnInput>;

export const ZFingerprint = z
  .string({ error: "is required" })
  .trim()
  .toLowerCase()
  .regex(/^[0-9a-f]{64}$/, "must be a SHA-256 fingerprint: 64 hexadecimal characters");

export const ZVerifyInput = z.object({ fingerprint: ZFingerprint });

/** The largest file /verify reads; a signed report is kept well under 8 MB. */
export const VERIFY_MAX_BYTES = 25 * 1024 * 1024;
