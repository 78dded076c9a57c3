import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import sharp from 'sharp';
import { startServer, type TestServer } from '../helpers/server';
import { Client } from '../helpers/client';
import { createDesign, signUp } from '../helpers/accounts';
import { exampleDesigns } from '~/lib/design';
import { frequencies, resonantFrequency, touchstoneRlc } from '../fixtures/workbench/rlc-sweep';

let s: TestServer;
let owner: Client;
let stranger: Client;
let anon: Client;
let id: string;

async function newDesign(name: string): Promise<string> {
  return (await createDesign(owner, name, exampleDesigns.find((e) => e.id === 'bench-sphere')!.design)).id;
}

function form(bytes: Uint8Array<ArrayBuffer> | string, name: string, type: string): FormData {
  const f = new FormData();
  f.set('file', new File([bytes], name, { type }));
  return f;
}

async function list(designId: string): Promise<Array<{ id: string; fileName: string }>> {
  const r = await owner.get(`/api/v1/designs/${designId}/attachments`);
  expect(r.status).toBe(200);
  return (await r.json()).attachments;
}

function filesUnder(dir: string): string[] {
  try {
    return readdirSync(dir).flatMap((e) => {
      const p = join(dir, e);
      return statSync(p).isDirectory() ? filesUnder(p) : [p];
    });
  } catch {
    return [];
  }
}

let png: Uint8Array<ArrayBuffer>;

beforeAll(async () => {
  s = await startServer();
  owner = (await signUp(s.url, 'Upload Owner')).c;
  stranger = (await signUp(s.url, 'Upload Stranger')).c;
  anon = new Client(s.url);
  id = await newDesign('Upload coil');
  png = new Uint8Array(await sharp({ create: { width: 640, height: 480, channels: 3, background: { r: 200, g: 120, b: 40 } } }).png().toBuffer());
});
afterAll(async () => {
  await s?.stop();
});

describe('POST /api/v1/designs/:id/attachments', () => {
  it('POST attachments stores a photo in S3; GET returns the same bytes and a 320 px WebP thumbnail', async () => {
    const r = await owner.req('POST', `/api/v1/designs/${id}/attachments`, form(png, 'first light.png', 'image/png'));
    expect(r.status).toBe(201);
    const a = await r.json();
    expect(a).toMatchObject({ kind: 'photo', contentType: 'image/png', size: png.length, fileName: 'first light.png' });

    const file = await owner.get(a.url);
    expect(file.status).toBe(200);
    expect(file.headers.get('content-type')).toBe('image/png');
    expect(new Uint8Array(await file.arrayBuffer())).toEqual(png);

    const thumb = await owner.get(a.thumbnailUrl);
    expect(thumb.status).toBe(200);
    const meta = await sharp(new Uint8Array(await thumb.arrayBuffer())).metadata();
    expect(meta.format).toBe('webp');
    expect(meta.width).toBe(320);
    expect(meta.height).toBe(240);

    expect((await list(id)).map((x) => x.id)).toContain(a.id);
  });

  it('POST attachments accepts JPEG and WebP by their content, whatever the name says', async () => {
    const jpeg = new Uint8Array(await sharp(png).jpeg().toBuffer());
    const webp = new Uint8Array(await sharp(png).webp().toBuffer());
    const a = await owner.req('POST', `/api/v1/designs/${id}/attachments`, form(jpeg, 'bench.jpg', 'image/jpeg'));
    expect(a.status).toBe(201);
    expect((await a.json()).contentType).toBe('image/jpeg');
    const b = await owner.req('POST', `/api/v1/designs/${id}/attachments`, form(webp, 'gap', ''));
    expect(b.status).toBe(400); // no image type declared and no image extension: not taken as a photo
    const c = await owner.req('POST', `/api/v1/designs/${id}/attachments`, form(webp, 'gap.webp', ''));
    expect(c.status).toBe(201);
    expect((await c.json()).contentType).toBe('image/webp');
  });

  it('GET /api/v1/attachments/:id and its thumbnail are 404 for a stranger and ask an anonymous caller to sign in', async () => {
    const [a] = await list(id);
    for (const [c, status] of [[stranger, 404], [anon, 401]] as const) {
      expect((await c.get(`/api/v1/attachments/${a.id}`)).status).toBe(status);
      expect((await c.get(`/api/v1/attachments/${a.id}/thumbnail`)).status).toBe(status);
    }
    expect((await stranger.get(`/api/v1/designs/${id}/attachments`)).status).toBe(404);
    expect((await anon.get(`/api/v1/designs/${id}/attachments`)).status).toBe(401);
    expect((await stranger.req('POST', `/api/v1/designs/${id}/attachments`, form(png, 'x.png', 'image/png'))).status).toBe(404);
  });

  it('POST attachments refuses an oversized photo and instrument file with 413 naming file, and stores nothing', async () => {
    const before = await list(id);
    const storedBefore = filesUnder(join(s.dataDir, 's3')).length;
    const big = new Uint8Array(10 * 1024 * 1024 + 1);
    big.set(png.subarray(0, 8));
    const r = await owner.req('POST', `/api/v1/designs/${id}/attachments`, form(big, 'huge.png', 'image/png'));
    expect(r.status).toBe(413);
    const body = await r.json();
    expect(body.error.code).toBe('payload_too_large');
    expect(body.error.message).toMatch(/10 MB/);
    expect(body.error.issues[0].path).toBe('file');

    const bigText = '! too long\n' + 'x'.repeat(2 * 1024 * 1024);
    const r2 = await owner.req('POST', `/api/v1/designs/${id}/attachments`, form(bigText, 'sweep.s1p', 'application/octet-stream'));
    expect(r2.status).toBe(413);
    expect((await r2.json()).error.message).toMatch(/2 MB/);

    expect(await list(id)).toEqual(before);
    expect(filesUnder(join(s.dataDir, 's3')).length).toBe(storedBefore);
  });

  it('POST attachments refuses a wrong type, and a “PNG” whose bytes are not an image, with 400 naming file', async () => {
    const before = await list(id);
    const exe = await owner.req('POST', `/api/v1/designs/${id}/attachments`, form(new Uint8Array([0x4d, 0x5a, 0, 0]), 'tool.exe', 'application/octet-stream'));
    expect(exe.status).toBe(400);
    const e1 = await exe.json();
    expect(e1.error.code).toBe('unsupported_media_type');
    expect(e1.error.issues[0].path).toBe('file');
    expect(e1.error.message).toMatch(/JPEG, PNG, WebP/);

    const fake = await owner.req('POST', `/api/v1/designs/${id}/attachments`, form('<html>not a picture</html>', 'photo.png', 'image/png'));
    expect(fake.status).toBe(400);
    const e2 = await fake.json();
    expect(e2.error.code).toBe('unsupported_media_type');
    expect(e2.error.message).toMatch(/not a JPEG, PNG or WebP image/);

    const jpegAsPng = new Uint8Array(await sharp(png).jpeg().toBuffer());
    const mismatch = await owner.req('POST', `/api/v1/designs/${id}/attachments`, form(jpegAsPng, 'photo.png', 'image/png'));
    expect(mismatch.status).toBe(400);

    const missing = await owner.req('POST', `/api/v1/designs/${id}/attachments`, new FormData());
    expect(missing.status).toBe(400);
    expect((await missing.json()).error.issues[0].path).toBe('file');

    expect(await list(id)).toEqual(before);
  });

  it('POST attachments reads a Touchstone sweep and returns its resonance', async () => {
    const rlc = { R: 10, L: 1e-3, C: 100e-12 };
    const text = touchstoneRlc(rlc, 1, 'kHz', 'DB', frequencies(400e3, 600e3, 201));
    const r = await owner.req('POST', `/api/v1/designs/${id}/attachments`, form(text, 'bare coil.s1p', 'application/octet-stream'));
    expect(r.status).toBe(201);
    const a = await r.json();
    expect(a.kind).toBe('instrument');
    expect(a.thumbnailUrl).toBeNull();
    expect(a.sweep.ok).toBe(true);
    expect(Math.abs(a.sweep.resonances[0].frequency / resonantFrequency(rlc) - 1)).toBeLessThan(0.005);

    const bad = await owner.req('POST', `/api/v1/designs/${id}/attachments`, form('# kHz S RI R 50\n1 0 0\n2 x 0\n', 'broken.s1p', 'text/plain'));
    expect(bad.status).toBe(201); // kept as a file; the parse error is reported
    expect((await bad.json()).sweep).toEqual({ ok: false, message: 'Line 3: "x" in column 2 is not a number.' });
  });
});

describe('DELETE /api/v1/attachments/:id and design deletion', () => {
  it('DELETE attachments is 404 for a stranger, 204 for the owner, and the file is gone', async () => {
    const [a] = await list(id);
    expect((await stranger.del(`/api/v1/attachments/${a.id}`)).status).toBe(404);
    expect((await owner.del(`/api/v1/attachments/${a.id}`)).status).toBe(204);
    expect((await owner.get(`/api/v1/attachments/${a.id}`)).status).toBe(404);
    expect((await list(id)).map((x) => x.id)).not.toContain(a.id);
  });

  it('DELETE /api/v1/designs/:id removes the design’s files from storage', async () => {
    const doomed = await newDesign('Doomed coil');
    const up = await owner.req('POST', `/api/v1/designs/${doomed}/attachments`, form(png, 'gone.png', 'image/png'));
    expect(up.status).toBe(201);
    const a = await up.json();
    const s3Dir = join(s.dataDir, 's3');
    expect(filesUnder(s3Dir).some((p) => p.includes(doomed))).toBe(true);
    expect((await owner.del(`/api/v1/designs/${doomed}`)).status).toBe(204);
    expect(filesUnder(s3Dir).some((p) => p.includes(doomed))).toBe(false);
    expect((await owner.get(`/api/v1/attachments/${a.id}`)).status).toBe(404);
  });
});
