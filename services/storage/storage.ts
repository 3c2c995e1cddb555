import "server-only";
import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";

// Object storage for uploaded files (datasheets, bench data): any
// S3-compatible store; locally s3rver on S3_ENDPOINT. Path-style addressing
// because s3rver (and most self-hosted stores) do not resolve bucket
// subdomains. Checksums only when the operation requires them: s3rver does
// not understand the flexible-checksum headers newer SDKs add by default.
const globalForS3 = globalThis as unknown as { heatsplitS3?: S3Client };

function env(name: string): string {
  const v = process.env[name];
  if (!v) throw new Error(`${name} is not set`);
  return v;
}

function client(): S3Client {
  globalForS3.heatsplitS3 ??= new S3Client({
    endpoint: process.env.S3_ENDPOINT || undefined,
    region: process.env.S3_REGION ?? "us-east-1",
    forcePathStyle: true,
    credentials: { accessKeyId: env("S3_ACCESS_KEY_ID"), secretAccessKey: env("S3_SECRET_ACCESS_KEY") },
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
  return globalForS3.heatsplitS3;
}

function bucket(): string {
  return env("S3_BUCKET");
}

export async function putObject({ key, body, contentType }: { key: string; body: Uint8Array; contentType: string }): Promise<void> {
  await client().send(new PutObjectCommand({ Bucket: bucket(), Key: key, Body: body, ContentType: contentType, ContentLength: body.byteLength }));
}

/** The object as a web stream (for a Response body), or null when it is missing. */
export async function getObjectStream(key: string): Promise<{ stream: ReadableStream<Uint8Array>; size: number | null } | null> {
  try {
    const out = await client().send(new GetObjectCommand({ Bucket: bucket(), Key: key }));
    if (!out.Body) return null;
    return { stream: out.Body.transformToWebStream() as ReadableStream<Uint8Array>, size: out.ContentLength ?? null };
  } catch (e) {
    const name = (e as { name?: string }).name;
    if (name === "NoSuchKey" || name === "NotFound") return null;
    throw e;
  }
}

/** Deleting a missing object succeeds (S3 semantics), so cleanup may run twice. */
export async function deleteObject(key: string): Promise<void> {
  await client().send(new DeleteObjectCommand({ Bucket: bucket(), Key: key }));
}
