// npm start's entry: compiles scripts/start.ts (and the project sources it imports) into one plain ES module
// with esbuild, packages left as imports, then runs it with Node's own loader. Serving from compiled
// JavaScript keeps a TypeScript loader out of the serving process: the built app imports its route modules
// with import() on every request, and each would otherwise be a round trip to the loader's thread.
import { build } from 'esbuild';
import { mkdirSync, renameSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';

const root = resolve(import.meta.dirname, '..');
const outfile = join(root, 'node_modules/.cache/coilwright/start.mjs');
mkdirSync(dirname(outfile), { recursive: true });
const { outputFiles } = await build({
  entryPoints: [join(root, 'scripts/start.ts')],
  outfile,
  write: false,
  bundle: true,
  platform: 'node',
  format: 'esm',
  target: 'node20',
  packages: 'external',
  sourcemap: 'inline',
  logLevel: 'warning',
  // the compiled file lives elsewhere: the start script finds the project from this
  define: { 'process.env.COILWRIGHT_ROOT': JSON.stringify(root) },
});
// Several servers may start at once (the test suite runs them side by side): each writes its own file and
// renames it into place, so none ever reads a half-written one.
for (const f of outputFiles) {
  const tmp = `${f.path}.${process.pid}.tmp`;
  writeFileSync(tmp, f.contents);
  renameSync(tmp, f.path);
}
await import(pathToFileURL(outfile).href);
