// The baseline for the API figures: a bare node:http server answering the same bytes as the app.
//   /solve   parses and solves the posted design like POST /api/v1/solve (same service function)
//   /design  reads the design's row from the same libSQL file on every request, then sends the app's bytes
//   /page, /home   the app's bytes for the design page and the home page, from memory
// Env: PORT, BENCH_DB (file path), BENCH_DESIGN_ID, BENCH_BODIES (JSON file {design, page, home}).
import { createServer } from 'node:http';
import { readFileSync } from 'node:fs';
import { createClient } from '@libsql/client';
import { solveInput } from '../../src/server/services/solve';

const bodies = JSON.parse(readFileSync(process.env.BENCH_BODIES!, 'utf8')) as Record<'design' | 'page' | 'home', string>;
const db = createClient({ url: `file:${process.env.BENCH_DB}` });
const id = process.env.BENCH_DESIGN_ID!;
const bytes = { design: Buffer.from(bodies.design), page: Buffer.from(bodies.page), home: Buffer.from(bodies.home) };

createServer((req, res) => {
  if (req.url === '/solve') {
    const chunks: Buffer[] = [];
    req.on('data', (c) => chunks.push(c));
    req.on('end', () => {
      const body = JSON.stringify(solveInput(JSON.parse(Buffer.concat(chunks).toString('utf8'))).result);
      res.writeHead(200, { 'content-type': 'application/json' }).end(body);
    });
    return;
  }
  if (req.url === '/design') {
    db.execute({ sql: 'SELECT id, name, design, revision FROM designs WHERE id = ?', args: [id] }).then(
      (r) => res.writeHead(r.rows.length ? 200 : 404, { 'content-type': 'application/json' }).end(bytes.design),
      () => res.writeHead(500).end(),
    );
    return;
  }
  const b = req.url === '/page' ? bytes.page : req.url === '/home' ? bytes.home : null;
  if (!b) return void res.writeHead(404).end();
  res.writeHead(200, { 'content-type': req.url === '/page' || req.url === '/home' ? 'text/html; charset=utf-8' : 'application/json' }).end(b);
}).listen(Number(process.env.PORT), '127.0.0.1', () => console.log('ready'));
