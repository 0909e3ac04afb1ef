import { GetObjectCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import type { Readable } from 'node:stream';
import { config } from '../config.js';

let client: S3Client | null = null;

/** The one S3 client (path-style addressing for the local s3rver fake and most S3-compatible stores). */
export function s3(): S3Client {
  client ??= new S3Client({
    endpoint: config.s3.endpoint,
    region: config.s3.region,
    forcePathStyle: true,
    credentials: { accessKeyId: config.s3.accessKeyId, secretAccessKey: config.s3.secretAccessKey },
  });
  return client;
}

export async function putObject(key: string, body: Buffer, contentType: string): Promise<void> {
  await s3().send(new PutObjectCommand({ Bucket: config.s3.bucket, Key: key, Body: body, ContentType: contentType }));
}

/** A readable stream of a stored object with its length. */
export async function getObjectStream(key: string): Promise<{ stream: Readable; length: number | undefined }> {
  const out = await s3().send(new GetObjectCommand({ Bucket: config.s3.bucket, Key: key }));
  return { stream: out.Body as Readable, length: out.ContentLength };
}

export async function getObjectBuffer(key: string): Promise<Buffer> {
  const { stream } = await getObjectStream(key);
  const chunks: Buffer[] = [];
  for await (const c of stream) chunks.push(c as Buffer);
  return Buffer.concat(chunks);
}
