import "server-only";
// Every file of the product (photos, drawings, signed PDFs) goes through the S3
// API, so the same code runs against AWS S3 or any S3-compatible store by
// configuration alone. The server chooses every key (lib/storage/keys.ts).
import {
  DeleteObjectsCommand,
  GetObjectCommand,
  HeadObjectCommand,
  PutObjectCommand,
  S3Client,
  type S3ClientConfig,
} from "@aws-sdk/client-s3";
import { getSignedUrl } from "@aws-sdk/s3-request-presigner";
import { serverEnv } from "@/lib/env";

type TClients = { server: S3Client; presign: S3Client; bucket: string };
const globalForS3 = globalThis as unknown as { tankwrightS3?: TClients };

function config(endpoint: string | undefined): S3ClientConfig {
  const env = serverEnv();
  return {
    region: env.S3_REGION,
    ...(endpoint ? { endpoint } : {}),
    forcePathStyle: env.S3_FORCE_PATH_STYLE,
    ...(env.S3_ACCESS_KEY_ID && env.S3_SECRET_ACCESS_KEY
      ? { credentials: { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY } }
      : {}),
    // Checksums only where the API requires them: S3-compatible stores that do not
    // know the newer checksum headers would otherwise keep the chunk framing.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  };
}

function clients(): TClients {
  if (!globalForS3.tankwrightS3) {
    const env = serverEnv();
    globalForS3.tankwrightS3 = {
      server: new S3Client(config(env.S3_ENDPOINT)),
      presign: new S3Client(config(env.S3_PUBLIC_ENDPOINT ?? env.S3_ENDPOINT)),
      bucket: env.S3_BUCKET,
    };
  }
  return globalForS3.tankwrightS3;
}

/** A URL the browser PUTs one object to: its type and length are part of the signature. */
export async function presignUpload({ key, contentType, sizeBytes, expiresIn }: { key: string; contentType: string; sizeBytes: number; expiresIn: number }) {
  const { presign, bucket } = clients();
  const url = await getSignedUrl(presign, new PutObjectCommand({ Bucket: bucket, Key: key, ContentType: contentType, ContentLength: sizeBytes }), {
    expiresIn,
    signableHeaders: new Set(["content-type", "content-length"]),
  });
  return { url, method: "PUT" as const, headers: { "Content-Type": contentType } };
}

/** A short-lived URL to read one object, shown inline or downloaded under a file name of our choosing. */
export async function presignDownload({ key, expiresIn = 300, fileName, inline = true, contentType }: { key: string; expiresIn?: number; fileName?: string; inline?: boolean; contentType?: string }) {
  const { presign, bucket } = clients();
  const disposition = fileName ? `${inline ? "inline" : "attachment"}; filename="${fileName.replace(/[^\w. -]+/g, "_")}"` : undefined;
  return getSignedUrl(
    presign,
    new GetObjectCommand({ Bucket: bucket, Key: key, ResponseContentDisposition: disposition, ResponseContentType: contentType }),
    { expiresIn },
  );
}

/** Size and type of a stored object, or null when there is none. */
export async function statObject(key: string): Promise<{ sizeBytes: number; contentType: string | undefined } | null> {
  const { server, bucket } = clients();
  try {
    const head = await server.send(new HeadObjectCommand({ Bucket: bucket, Key: key }));
    return { sizeBytes: head.ContentLength ?? 0, contentType: head.ContentType };
  } catch (error) {
    const status = (error as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode;
    if (status === 404 || (error as { name?: string }).name === "NotFound") return null;
    throw error;
  }
}

/** Reads a whole object into memory; refuses one larger than maxBytes. */
export async function readObject(key: string, maxBytes: number): Promise<Buffer> {
  const { server, bucket } = clients();
  const res = await server.send(new GetObjectCommand({ Bucket: bucket, Key: key }));
  if ((res.ContentLength ?? 0) > maxBytes) throw new Error(`object ${key} is larger than ${maxBytes} bytes`);
  const bytes = await res.Body!.transformToByteArray();
  return Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
}

export async function writeObject({ key, body, contentType }: { key: string; body: Buffer; contentType: string }) {
  const { server, bucket } = clients();
  await server.send(new PutObjectCommand({ Bucket: bucket, Key: key, Body: body, ContentType: contentType, ContentLength: body.length }));
}

/** Deletes objects; keys that do not exist are not an error. */
export async function deleteObjects(keys: readonly (string | null | undefined)[]) {
  const list = keys.filter((k): k is string => Boolean(k));
  if (!list.length) return;
  const { server, bucket } = clients();
  for (let i = 0; i < list.length; i += 1000) {
    await server.send(new DeleteObjectsCommand({ Bucket: bucket, Delete: { Objects: list.slice(i, i + 1000).map((Key) => ({ Key })), Quiet: true } }));
  }
}
