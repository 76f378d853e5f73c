import "server-only";
// The object store, reached only through the AWS SDK: s3rver locally, S3 or any
// S3-compatible store in production. Browsers get short-lived presigned URLs, never keys.
import {
  AbortMultipartUploadCommand, CompleteMultipartUploadCommand, CreateMultipartUploadCommand, DeleteObjectsCommand, GetObjectCommand, HeadObjectCommand,
  ListObjectsV2Command, PutObjectCommand, S3Client, UploadPartCommand,
} from "@aws-sdk/client-s3";
import { getSignedUrl } from "@aws-sdk/s3-request-presigner";
import { env } from "@/lib/config/env";

function client(endpoint: string | undefined) {
  const e = env();
  return new S3Client({
    region: e.S3_REGION,
    endpoint,
    forcePathStyle: e.S3_FORCE_PATH_STYLE,
    credentials: { accessKeyId: e.S3_ACCESS_KEY_ID, secretAccessKey: e.S3_SECRET_ACCESS_KEY },
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
}

const globalForS3 = globalThis as unknown as { fitframeS3?: S3Client; fitframeS3Public?: S3Client };
const s3 = () => (globalForS3.fitframeS3 ??= client(env().S3_ENDPOINT));
// URLs handed to browsers are signed for the address the browser reaches.
const s3Public = () => (globalForS3.fitframeS3Public ??= client(env().S3_PUBLIC_ENDPOINT ?? env().S3_ENDPOINT));
const bucket = () => env().S3_BUCKET;

export const clipPrefix = (studioId: string, clipId: string) => `studios/${studioId}/clips/${clipId}/`;
export const clipKeys = (studioId: string, clipId: string) => {
  const prefix = clipPrefix(studioId, clipId);
  return {
    source: `${prefix}source`,
    frame: (n: number) => `${prefix}frames/${String(n).padStart(6, "0")}.jpg`,
    strip: `${prefix}strip.jpg`,
    poster: `${prefix}poster.jpg`,
    proxy: `${prefix}proxy.mp4`,
  };
};

export async function presignUpload(key: string, contentType: string, sizeBytes: number, expiresInS = 15 * 60) {
  const command = new PutObjectCommand({ Bucket: bucket(), Key: key, ContentType: contentType, ContentLength: sizeBytes });
  return getSignedUrl(s3Public(), command, { expiresIn: expiresInS, signableHeaders: new Set(["content-type", "content-length"]) });
}

/** Large files go up in parts: the store's multipart upload, each part by its own presigned PUT. */
export async function startMultipartUpload(key: string, contentType: string): Promise<string> {
  const started = await s3().send(new CreateMultipartUploadCommand({ Bucket: bucket(), Key: key, ContentType: contentType }));
  return started.UploadId!;
}

export async function presignUploadPart(key: string, uploadId: string, partNumber: number, expiresInS = 15 * 60) {
  const command = new UploadPartCommand({ Bucket: bucket(), Key: key, UploadId: uploadId, PartNumber: partNumber });
  return getSignedUrl(s3Public(), command, { expiresIn: expiresInS });
}

export async function finishMultipartUpload(key: string, uploadId: string, parts: { partNumber: number; etag: string }[]) {
  await s3().send(new CompleteMultipartUploadCommand({
    Bucket: bucket(), Key: key, UploadId: uploadId,
    MultipartUpload: { Parts: [...parts].sort((a, b) => a.partNumber - b.partNumber).map((p) => ({ PartNumber: p.partNumber, ETag: p.etag })) },
  }));
}

/**
 * Drops a multipart upload's stored parts. A store that does not know the upload (already finished
 * or aborted) or does not implement aborting (the local fake answers 405) is left to the bucket's
 * lifecycle rule; the answer says which happened.
 */
export async function abortMultipartUpload(key: string, uploadId: string): Promise<"aborted" | "not-there" | "unsupported"> {
  try {
    await s3().send(new AbortMultipartUploadCommand({ Bucket: bucket(), Key: key, UploadId: uploadId }));
    return "aborted";
  } catch (err) {
    const status = (err as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode;
    if (status === 404) return "not-there";
    if (status === 405 || status === 501) return "unsupported";
    throw err;
  }
}

export async function presignDownload(key: string, expiresInS = 5 * 60) {
  const command = new GetObjectCommand({ Bucket: bucket(), Key: key, ResponseCacheControl: `private, max-age=${expiresInS}` });
  return getSignedUrl(s3Public(), command, { expiresIn: expiresInS });
}

/** The stored object's size, or null when it is not there. */
export async function objectSize(key: string): Promise<number | null> {
  try {
    const head = await s3().send(new HeadObjectCommand({ Bucket: bucket(), Key: key }));
    return head.ContentLength ?? 0;
  } catch (err) {
    if ((err as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode === 404) return null;
    throw err;
  }
}

export async function putObject(key: string, body: Buffer | Uint8Array | string, contentType: string) {
  await s3().send(
    new PutObjectCommand({ Bucket: bucket(), Key: key, Body: body, ContentType: contentType, CacheControl: "private, max-age=31536000, immutable" }),
  );
}

export async function getObjectStream(key: string) {
  const res = await s3().send(new GetObjectCommand({ Bucket: bucket(), Key: key }));
  return res.Body;
}

export async function listKeys(prefix: string): Promise<string[]> {
  const keys: string[] = [];
  let token: string | undefined;
  do {
    const page = await s3().send(new ListObjectsV2Command({ Bucket: bucket(), Prefix: prefix, ContinuationToken: token }));
    for (const o of page.Contents ?? []) if (o.Key) keys.push(o.Key);
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
  return keys;
}

export async function deleteKeys(keys: string[]) {
  for (let i = 0; i < keys.length; i += 1000) {
    const chunk = keys.slice(i, i + 1000);
    await s3().send(new DeleteObjectsCommand({ Bucket: bucket(), Delete: { Objects: chunk.map((Key) => ({ Key })) } }));
  }
}
