import { describe, expect, it } from 'vitest';
import { PDFParse } from 'pdf-parse';
import { exampleDesigns, parseDesign } from '~/lib/design';
import { solve } from '~/solver';
import { buildSheet, sheetSections } from '~/lib/buildsheet';
import { renderBuildSheetPdf } from '~/server/pdf/build-sheet';
import { winAnsi } from '~/server/pdf/text';

describe('renderBuildSheetPdf(input)', () => {
  it('renderBuildSheetPdf writes Helvetica text that parses back, with symbols outside WinAnsi spelled out', async () => {
    const parsed = parseDesign(exampleDesigns.find((e) => e.id === 'bench-sphere')!.design);
    if (!parsed.ok) throw new Error('example does not parse');
    const result = solve(parsed.design);
    const sheet = buildSheet(parsed.design, result, { rpm: 50, margin: 0.2, every: 200 });
    const pdf = await renderBuildSheetPdf({ designName: 'Bench sphere', revision: 3, generatedAt: new Date('2026-05-01T00:00:00Z'), sections: sheetSections(sheet), options: { rpm: 50, margin: 0.2, every: 200 } });
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(pdf.toString('latin1')).toContain('/BaseFont /Helvetica');
    expect(pdf.toString('latin1')).not.toContain('/FontFile'); // nothing embedded
    const parser = new PDFParse({ data: new Uint8Array(pdf) });
    const text = (await parser.getText()).text;
    await parser.destroy();
    expect(text).toContain('Build sheet: Bench sphere');
    expect(text).toContain('Revision 3 · made 2026-05-01');
    expect(text).toContain(`Wire to buy ${(result.secondary!.wireLength * 1.2).toFixed(1)} m`);
    expect(text).toContain(`Winding time ${Math.floor(800 / 50)} min 0 s`);
    expect(text).toMatch(/DC resistance [\d.]+ ohm/);
    expect(text).toContain('Stored energy can kill');
  });

  it('winAnsi spells out characters the standard fonts lack and keeps those they have', () => {
    expect(winAnsi('10 MΩ ≥ 2 × √W ≈ π µF ½ W')).toBe('10 Mohm >= 2 × sqrtW ~ pi µF ½ W');
    expect(winAnsi('漢')).toBe('?');
  });
});
