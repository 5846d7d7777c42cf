/**
 * The one module that talks to S3-compatible file storage (in development and tests the s3rver
 * fake in fakes/s3). Short timeouts and one retry; any failure becomes a 503 that says plainly
 * what happened, so a caller never has to know the SDK's errors.
 */
import type { Readable } from "node:stream";
import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import type { Env } from "../env";
import { notFound, unavailable } from "../http/errors";

export const STORAGE_WRITE_FAILED =
  "File storage is not answering right now; nothing was saved. Try again in a minute.";
const STORAGE_READ_FAILED = "File storage is not answering right now. Try again in a minute.";

export type StoredObject = { stream: Readable; contentLength: number | null };

export type Storage = {
  putObject(key: string, body: Buffer, contentType: string): Promise<void>;
  getObjectStream(key: string): Promise<StoredObject>;
  deleteObject(key: string): Promise<void>;
};

type StorageEnv = Pick<Env, "S3_ENDPOINT" | "S3_REGION" | "S3_BUCKET" | "S3_ACCESS_KEY_ID" | "S3_SECRET_ACCESS_KEY">;

/** The storage adapter of one app, built by the composition root from its environment. */
export function createStorage(env: StorageEnv): Storage {
  const client = new S3Client({
    endpoint: env.S3_ENDPOINT,
    region: env.S3_REGION,
    credentials: { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY },
    forcePathStyle: true,
    maxAttempts: 2,
    requestHandler: { connectionTimeout: 2_000, requestTimeout: 15_000 },
    // Checksums only where S3 demands them: the SHA-256 we keep is our own, computed before the upload.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
  const Bucket = env.S3_BUCKET;
  const failed = (operation: string, err: unknown, message: string) => {
    console.error(
      `[storage] ${operation} failed: ${(err as Error)?.name ?? "Error"} ${(err as Error)?.message ?? ""}`.trim(),
    );
    return unavailable(message);
  };
  return {
    async putObject(key, body, contentType) {
      try {
        await client.send(
          new PutObjectCommand({ Bucket, Key: key, Body: body, ContentType: contentType, ContentLength: body.length }),
        );
      } catch (err) {
        throw failed("put", err, STORAGE_WRITE_FAILED);
      }
    },
    async getObjectStream(key) {
      try {
        const object = await client.send(new GetObjectCommand({ Bucket, Key: key }));
        return { stream: object.Body as Readable, contentLength: object.ContentLength ?? null };
      } catch (err) {
        if ((err as Error)?.name === "NoSuchKey") throw notFound("That file");
        throw failed("get", err, STORAGE_READ_FAILED);
      }
    },
    async deleteObject(key) {
      try {
        await client.send(new DeleteObjectCommand({ Bucket, Key: key }));
      } catch (err) {
        throw failed("delete", err, STORAGE_WRITE_FAILED);
      }
    },
  };
}
