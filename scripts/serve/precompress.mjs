// @ts-check
// Astro integration: after `astro build`, writes .br (quality 11) and .gz (level 9) siblings of the text
// files in the client output, which the start script's front server sends to clients that accept them.
import { readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { brotliCompressSync, constants, gzipSync } from 'node:zlib';

export const PRECOMPRESS_EXTENSIONS = ['.js', '.mjs', '.css', '.html', '.svg', '.json', '.txt', '.xml', '.webmanifest', '.map'];
const MIN_BYTES = 1024;

/** @param {string} dir @returns {Generator<string>} */
function* walk(dir) {
  for (const e of readdirSync(dir, { withFileTypes: true })) {
    const p = join(dir, e.name);
    if (e.isDirectory()) yield* walk(p);
    else yield p;
  }
}

/** @param {string} dir @returns {{ files: number, before: number, br: number, gz: number }} */
export function precompressDir(dir) {
  const totals = { files: 0, before: 0, br: 0, gz: 0 };
  for (const file of walk(dir)) {
    if (!PRECOMPRESS_EXTENSIONS.some((x) => file.endsWith(x))) continue;
    if (statSync(file).size < MIN_BYTES) continue;
    const body = readFileSync(file);
    const br = brotliCompressSync(body, {
      params: { [constants.BROTLI_PARAM_QUALITY]: 11, [constants.BROTLI_PARAM_SIZE_HINT]: body.byteLength, [constants.BROTLI_PARAM_MODE]: constants.BROTLI_MODE_TEXT },
    });
    const gz = gzipSync(body, { level: 9 });
    writeFileSync(`${file}.br`, br);
    writeFileSync(`${file}.gz`, gz);
    totals.files += 1;
    totals.before += body.byteLength;
    totals.br += br.byteLength;
    totals.gz += gz.byteLength;
  }
  return totals;
}

/** @returns {import('astro').AstroIntegration} */
export default function precompress() {
  /** @type {URL | undefined} */
  let clientDir;
  return {
    name: 'coilwright-precompress',
    hooks: {
      'astro:config:done': ({ config }) => {
        clientDir = config.build.client;
      },
      'astro:build:done': ({ logger }) => {
        if (!clientDir) return;
        const t = precompressDir(fileURLToPath(clientDir));
        const kb = (/** @type {number} */ n) => `${(n / 1024).toFixed(0)} KB`;
        logger.info(`${t.files} files: ${kb(t.before)} → brotli ${kb(t.br)}, gzip ${kb(t.gz)}`);
      },
    },
  };
}
