import "server-only";
import {
  DeleteObjectCommand,
  GetObjectCommand,
  NoSuchKey,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from "@aws-sdk/client-s3";
import { readS3Settings, type S3Settings } from "./s3-config";

// One client per server process, like the database pool in db/index.ts.
const globalForS3 = globalThis as unknown as { scarplineS3?: { client: S3Client; settings: S3Settings } };

function store(): { client: S3Client; settings: S3Settings } {
  if (!globalForS3.scarplineS3) {
    const settings = readS3Settings();
    const client = new S3Client({
      endpoint: settings.S3_ENDPOINT,
      region: settings.S3_REGION,
      forcePathStyle: settings.S3_FORCE_PATH_STYLE,
      credentials: { accessKeyId: settings.S3_ACCESS_KEY_ID, secretAccessKey: settings.S3_SECRET_ACCESS_KEY },
      // Checksums only where S3 demands them: by default the SDK may send aws-chunked bodies
      // with trailing checksums, which simple S3-compatible stores do not decode.
      requestChecksumCalculation: "WHEN_REQUIRED",
      responseChecksumValidation: "WHEN_REQUIRED",
    });
    globalForS3.scarplineS3 = { client, settings };
  }
  return globalForS3.scarplineS3;
}

/** Stores `body` under `key`, replacing any object already there. */
export async function putObject(key: string, body: Uint8Array, contentType: string): Promise<void> {
  const { client, settings } = store();
  await client.send(
    new PutObjectCommand({
      Bucket: settings.S3_BUCKET,
      Key: key,
      Body: body,
      ContentType: contentType,
      ContentLength: body.byteLength,
    }),
  );
}

export interface StoredObject {
  /** A web stream of the object's bytes, ready to hand to a `Response`. */
  body: ReadableStream<Uint8Array>;
  contentLength: number | undefined;
}

/** Opens the object for streaming; null when no object has that key. */
export async function getObjectStream(key: string): Promise<StoredObject | null> {
  const { client, settings } = store();
  try {
    const out = await client.send(new GetObjectCommand({ Bucket: settings.S3_BUCKET, Key: key }));
    if (!out.Body) return null;
    return { body: out.Body.transformToWebStream(), contentLength: out.ContentLength };
  } catch (err) {
    if (isMissing(err)) return null;
    throw err;
  }
}

/** Removes the object; deleting a key that is already gone is not an error (S3 answers 204 either way). */
export async function deleteObject(key: string): Promise<void> {
  const { client, settings } = store();
  await client.send(new DeleteObjectCommand({ Bucket: settings.S3_BUCKET, Key: key }));
}

function isMissing(err: unknown): boolean {
  if (err instanceof NoSuchKey) return true;
  return err instanceof S3ServiceException && err.$metadata.httpStatusCode === 404;
}
