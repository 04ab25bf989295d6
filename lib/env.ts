import { z } from "zod";

// Every setting the server reads, validated once. A missing or malformed
// variable stops start-up with its name in the message.
const ZServerEnv = z.object({
  DATABASE_URL: z.url({ protocol: /^postgres(ql)?$/, error: "must be a postgres:// URL" }),
  AUTH_SECRET: z.string().min(32, "must be at least 32 characters"),
  APP_URL: z.url().default("http://127.0.0.1:3000"),
  DATABASE_POOL_MAX: z.coerce.number().int().min(1).max(100).default(10),
  // Object storage through the S3 API (AWS S3 or any S3-compatible store).
  S3_ENDPOINT: z.url().optional(),
  /** The address browsers use for presigned URLs, when it differs from the one the server uses. */
  S3_PUBLIC_ENDPOINT: z.url().optional(),
  S3_REGION: z.string().min(1).default("us-east-1"),
  S3_BUCKET: z.string({ error: "is required: the bucket for photos, drawings and signed PDFs" }).min(3),
  S3_ACCESS_KEY_ID: z.string().min(1).optional(),
  S3_SECRET_ACCESS_KEY: z.string().min(1).optional(),
  S3_FORCE_PATH_STYLE: z.stringbool().default(false),
  /** How long a presigned upload URL stays valid. */
  UPLOAD_URL_TTL_SECONDS: z.coerce.number().int().min(30).max(3600).default(900),
  /** Whether this app instance also works the background job queue (on by default). */
  JOBS_WORKER: z.stringbool().default(true),
  SMTP_URL: z.url({ protocol: /^smtps?$/, error: "must be an smtp:// or smtps:// URL" }).optional(),
  MAIL_FROM: z.string().min(3).default("Tankwright <reports@tankwright.test>"),
  /** A signed report larger than this goes out as a download link instead of an attachment. */
  MAIL_ATTACHMENT_LIMIT_BYTES: z.coerce.number().int().min(1024, "must be at least 1024 bytes").default(10 * 1024 * 1024),
  /** How long a report download link in an e-mail works: at most 7 days, the longest a presigned S3 URL lasts. */
  REPORT_LINK_TTL_SECONDS: z.coerce.number().int().min(60, "must be at least 60 seconds").max(604800, "must be at most 604800 (7 days, the presigned URL maximum)").default(604800),
});
export type TServerEnv = z.infer<typeof ZServerEnv>;

export function parseServerEnv(source: Record<string, string | undefined>): TServerEnv {
  const result = ZServerEnv.safeParse({
    ...source,
    AUTH_SECRET: source.AUTH_SECRET ?? source.NEXTAUTH_SECRET,
    APP_URL: source.APP_URL ?? source.NEXTAUTH_URL,
  });
  if (!result.success) {
    const lines = result.error.issues.map((i) => `  ${i.path.join(".") || "(environment)"}: ${i.message}`);
    throw new Error(`Invalid environment:\n${lines.join("\n")}`);
  }
  return result.data;
}

let cached: TServerEnv | undefined;
export function serverEnv(): TServerEnv {
  cached ??= parseServerEnv(process.env);
  return cached;
}
