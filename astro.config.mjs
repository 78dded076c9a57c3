// @ts-check
import { fileURLToPath } from 'node:url';
import { defineConfig } from 'astro/config';
import node from '@astrojs/node';
import react from '@astrojs/react';
import tailwindcss from '@tailwindcss/vite';
import precompress from './scripts/serve/precompress.mjs';

export default defineConfig({
  output: 'server',
  adapter: node({ mode: 'middleware' }),
  integrations: [react(), precompress()],
  security: { checkOrigin: false },
  vite: {
    plugins: [tailwindcss()],
    // ml-matrix's package entry for `import` wraps its CommonJS bundle, which cannot be tree-shaken; its own
    // ES module sources can, so the solver worker carries only the classes the field model uses.
    resolve: { alias: [{ find: /^ml-matrix$/, replacement: fileURLToPath(new URL('./node_modules/ml-matrix/src/index.js', import.meta.url)) }] },
    build: { chunkSizeWarningLimit: 900 },
    // module workers, so the solver worker can load the unit library (mathjs) only for texts that need it
    worker: { format: 'es' },
    ssr: { external: ['pdfkit', 'sharp', 's3rver', 'smtp-server', 'mailparser'] },
  },
});
