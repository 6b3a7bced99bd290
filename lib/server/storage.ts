import "server-only";
import { DeleteObjectCommand, GetObjectCommand, HeadObjectCommand, ListObjectsV2Command, PutBucketCorsCommand, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { getSignedUrl } from "@aws-sdk/s3-request-presigner";
import { env } from "./env";
import { logError } from "./log";

const g = globalThis as unknown as { __bwS3?: S3Client; __bwCors?: Promise<void> };

/** One S3 client per process, configured from the environment (the local fake or a hosted bucket). */
export function s3(): S3Client {
  if (!g.__bwS3) {
    const e = env();
    g.__bwS3 = new S3Client({
      region: e.S3_REGION,
      ...(e.S3_ENDPOINT ? { endpoint: e.S3_ENDPOINT } : {}),
      forcePathStyle: e.S3_FORCE_PATH_STYLE === "true",
      credentials: { accessKeyId: e.S3_ACCESS_KEY_ID, secretAccessKey: e.S3_SECRET_ACCESS_KEY },
    });
  }
  return g.__bwS3;
}

const bucket = () => env().S3_BUCKET;
const isLoopback = (url?: string) => !!url && /^https?:\/\/(127\.0\.0\.1|localhost)(:\d+)?/.test(url);

/**
 * Lets the browser PUT to the local fake from the app's origin. Only for a loopback endpoint: a
 * hosted bucket's CORS rules are set where the bucket is managed, not by the app.
 */
export function ensureDevCors(): Promise<void> {
  const e = env();
  if (!isLoopback(e.S3_ENDPOINT)) return Promise.resolve();
  g.__bwCors ??= s3()
    .send(new PutBucketCorsCommand({ Bucket: bucket(), CORSConfiguration: { CORSRules: [{ AllowedOrigins: ["*"], AllowedMethods: ["PUT", "GET"], AllowedHeaders: ["*"], MaxAgeSeconds: 600 }] } }))
    .then(() => undefined)
    .catch((err: unknown) => {
      g.__bwCors = undefined;
      logError("could not set CORS on the local storage fake", err);
    });
  return g.__bwCors;
}

/** A presigned PUT for one object with its content type, valid for `seconds`. */
export async function presignPut(key: string, contentType: string, seconds = 600): Promise<string> {
  await ensureDevCors();
  return getSignedUrl(s3(), new PutObjectCommand({ Bucket: bucket(), Key: key, ContentType: contentType }), { expiresIn: seconds, signableHeaders: new Set(["content-type"]) });
}

/** A presigned GET, valid for `seconds`. */
export function presignGet(key: string, seconds = 900): Promise<string> {
  return getSignedUrl(s3(), new GetObjectCommand({ Bucket: bucket(), Key: key }), { expiresIn: seconds });
}

/** The stored size in bytes, or null when the object does not exist. */
export async function objectSize(key: string): Promise<number | null> {
  try {
    const h = await s3().send(new HeadObjectCommand({ Bucket: bucket(), Key: key }));
    return h.ContentLength ?? 0;
  } catch (e) {
    const status = (e as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode;
    if (status === 404 || (e as Error).name === "NotFound" || (e as Error).name === "NoSuchKey") return null;
    throw e;
  }
}

/** Reads an object into memory, refusing past `maxBytes` (so a lying size cannot exhaust memory). */
export async function readObject(key: string, maxBytes: number): Promise<Buffer | null> {
  const out = await s3().send(new GetObjectCommand({ Bucket: bucket(), Key: key }));
  const body = out.Body as AsyncIterable<Uint8Array> | undefined;
  if (!body) return Buffer.alloc(0);
  const chunks: Buffer[] = [];
  let total = 0;
  for await (const c of body) {
    total += c.length;
    if (total > maxBytes) return null;
    chunks.push(Buffer.from(c));
  }
  return Buffer.concat(chunks);
}

export async function writeObject(key: string, data: Buffer, contentType: string): Promise<void> {
  await s3().send(new PutObjectCommand({ Bucket: bucket(), Key: key, Body: data, ContentType: contentType, ContentLength: data.length }));
}

export async function deleteObject(key: string): Promise<void> {
  await s3().send(new DeleteObjectCommand({ Bucket: bucket(), Key: key }));
}

/** Every object under `prefix` with its last change, a page of up to 1000 at a time. */
export async function* listObjects(prefix: string): AsyncGenerator<{ key: string; modifiedAt: Date }> {
  let token: string | undefined;
  do {
    const page = await s3().send(new ListObjectsV2Command({ Bucket: bucket(), Prefix: prefix, ContinuationToken: token }));
    for (const o of page.Contents ?? []) if (o.Key) yield { key: o.Key, modifiedAt: o.LastModified ?? new Date(0) };
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
}
