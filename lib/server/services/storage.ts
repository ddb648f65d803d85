import "server-only";
import { DeleteObjectCommand, GetObjectCommand, HeadBucketCommand, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { getSignedUrl } from "@aws-sdk/s3-request-presigner";
import { env } from "../env";

let client: S3Client | undefined;

/** The S3 client for the configured endpoint: the local fake in development, a real bucket in production. */
export function s3(): S3Client {
  const e = env();
  client ??= new S3Client({
    region: e.S3_REGION,
    endpoint: e.S3_ENDPOINT,
    forcePathStyle: e.S3_FORCE_PATH_STYLE,
    credentials: { accessKeyId: e.S3_ACCESS_KEY_ID, secretAccessKey: e.S3_SECRET_ACCESS_KEY },
    // Without these the SDK streams aws-chunked bodies that S3-compatible fakes store verbatim.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
  return client;
}

export async function putObject({ key, body, contentType }: { key: string; body: Uint8Array | string; contentType: string }) {
  await s3().send(new PutObjectCommand({ Bucket: env().S3_BUCKET, Key: key, Body: body, ContentType: contentType }));
}

export async function getObjectBytes(key: string): Promise<Uint8Array> {
  const out = await s3().send(new GetObjectCommand({ Bucket: env().S3_BUCKET, Key: key }));
  if (!out.Body) throw new Error(`Object ${key} has no body`);
  return out.Body.transformToByteArray();
}

/** Removes an object; removing one that is already gone is not an error in S3. */
export async function deleteObject(key: string) {
  await s3().send(new DeleteObjectCommand({ Bucket: env().S3_BUCKET, Key: key }));
}

/** A short-lived download link; the caller has already checked who may have it. */
export function presignedDownloadUrl(
  key: string,
  { expiresInSeconds = 300, fileName, inline = false }: { expiresInSeconds?: number; fileName?: string; inline?: boolean } = {},
) {
  const disposition = inline ? "inline" : "attachment";
  return getSignedUrl(
    s3(),
    new GetObjectCommand({
      Bucket: env().S3_BUCKET,
      Key: key,
      ...(fileName ? { ResponseContentDisposition: `${disposition}; filename="${fileName.replace(/"/g, "")}"` } : {}),
    }),
    { expiresIn: expiresInSeconds },
  );
}

export async function verifyStorage(): Promise<void> {
  await s3().send(new HeadBucketCommand({ Bucket: env().S3_BUCKET }));
}
