import { S3Client, PutObjectCommand, GetObjectCommand, DeleteObjectCommand, DeleteObjectsCommand } from '@aws-sdk/client-s3';
import { env } from '../env';

let client: S3Client | undefined;

function endpoint(): string {
  const e = env();
  const ep = e.S3_ENDPOINT || e.COILWRIGHT_DEV_S3_ENDPOINT;
  if (!ep) throw new Error('No S3 endpoint: set S3_ENDPOINT, or start the app with npm start');
  return ep;
}

export function s3(): S3Client {
  if (client) return client;
  const e = env();
  const fake = !e.S3_ENDPOINT;
  client = new S3Client({
    endpoint: endpoint(),
    region: e.S3_REGION,
    forcePathStyle: true,
    credentials: fake
      ? { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' }
      : { accessKeyId: e.S3_ACCESS_KEY_ID ?? '', secretAccessKey: e.S3_SECRET_ACCESS_KEY ?? '' },
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
  return client;
}

const bucket = () => env().S3_BUCKET;

export async function putObject(key: string, body: Uint8Array, contentType: string): Promise<void> {
  await s3().send(new PutObjectCommand({ Bucket: bucket(), Key: key, Body: body, ContentType: contentType }));
}

export async function getObject(key: string): Promise<{ body: Uint8Array; contentType: string } | null> {
  try {
    const r = await s3().send(new GetObjectCommand({ Bucket: bucket(), Key: key }));
    const bytes = await r.Body!.transformToByteArray();
    return { body: bytes, contentType: r.ContentType ?? 'application/octet-stream' };
  } catch (e) {
    if ((e as { name?: string }).name === 'NoSuchKey') return null;
    throw e;
  }
}

export async function deleteObjects(keys: string[]): Promise<void> {
  if (keys.length === 0) return;
  if (keys.length === 1) {
    await s3().send(new DeleteObjectCommand({ Bucket: bucket(), Key: keys[0] }));
    return;
  }
  await s3().send(new DeleteObjectsCommand({ Bucket: bucket(), Delete: { Objects: keys.map((Key) => ({ Key })) } }));
}
