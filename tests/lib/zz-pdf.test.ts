import { it } from 'vitest';
import { writeFileSync } from 'node:fs';
import { exampleDesigns, parseDesign } from '~/lib/design';
import { solve } from '~/solver';
import { buildSheet, sheetSections } from '~/lib/buildsheet';
import { renderBuildSheetPdf } from '~/server/pdf/build-sheet';
import { PDFParse } from 'pdf-parse';
it('pdf', async () => {
  const p = parseDesign(exampleDesigns[1].design); if (!p.ok) throw 1;
  const sheet = buildSheet(p.design, solve(p.design), { rpm: 40, margin: 0.1, every: 100 });
  const buf = await renderBuildSheetPdf({ designName: 'X', revision: 1, generatedAt: new Date(), sections: sheetSections(sheet), options: { rpm: 40, margin: 0.1, every: 100 } });
  writeFileSync('/tmp/sheet.pdf', buf);
  const parser = new PDFParse({ data: new Uint8Array(buf) });
  const r = await parser.getText();
  console.log(r.text.slice(0, 3000));
  await parser.destroy();
});
