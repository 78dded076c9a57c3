import PDFDocument from 'pdfkit';
import type { SheetSection } from '../../lib/buildsheet';
import { safetyNotes } from '../../lib/content/safety-notes';
import { winAnsi } from './text';

export interface BuildSheetPdfInput {
  designName: string;
  revision: number;
  generatedAt: Date;
  sections: SheetSection[];
  /** the query the sheet was made with, printed so a reader can reproduce it */
  options: { rpm: number; margin: number; every: number };
}

const INK = '#1d232b';
const MUTED = '#5b6570';
const CAUTION = '#7a4a00';

/** Renders the build sheet as an A4 PDF in Helvetica (a standard PDF font: nothing is fetched or embedded). */
export function renderBuildSheetPdf(input: BuildSheetPdfInput): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const doc = new PDFDocument({
      size: 'A4',
      margin: 48,
      info: { Title: winAnsi(`Build sheet: ${input.designName}`), Author: 'Coilwright', Subject: 'Build sheet' },
      bufferPages: true,
    });
    const chunks: Buffer[] = [];
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);

    const width = doc.page.width - doc.page.margins.left - doc.page.margins.right;
    const left = doc.page.margins.left;
    const t = (s: string) => winAnsi(s);

    doc.font('Helvetica-Bold').fontSize(18).fillColor(INK).text(t(`Build sheet: ${input.designName}`));
    doc
      .font('Helvetica')
      .fontSize(9)
      .fillColor(MUTED)
      .text(
        t(
          `Revision ${input.revision} · made ${input.generatedAt.toISOString().slice(0, 10)} · winder ${input.options.rpm} rpm · wire margin ${Math.round(input.options.margin * 100)} % · checkpoints every ${input.options.every} turns`,
        ),
      );
    doc.moveDown(0.8);

    for (const section of input.sections) {
      if (doc.y > doc.page.height - 140) doc.addPage();
      doc.font('Helvetica-Bold').fontSize(13).fillColor(INK).text(t(section.title), left, doc.y);
      doc.moveDown(0.3);

      for (const row of section.rows) {
        const y = doc.y;
        doc.font('Helvetica').fontSize(10).fillColor(MUTED).text(t(row.label), left, y, { width: width * 0.36 });
        const yLabel = doc.y;
        doc.font('Helvetica-Bold').fontSize(10).fillColor(INK).text(t(row.value), left + width * 0.38, y, { width: width * 0.62 });
        if (row.note) doc.font('Helvetica').fontSize(8).fillColor(MUTED).text(t(row.note), left + width * 0.38, doc.y, { width: width * 0.62 });
        doc.y = Math.max(doc.y, yLabel) + 3;
        if (doc.y > doc.page.height - 70) doc.addPage();
      }

      if (section.table) {
        const cols = section.table.columns.length;
        const colW = width / cols;
        const header = doc.y;
        doc.font('Helvetica-Bold').fontSize(9).fillColor(INK);
        section.table.columns.forEach((c, i) => doc.text(t(c), left + i * colW, header, { width: colW - 6 }));
        doc.moveDown(0.2);
        doc.font('Helvetica').fontSize(9);
        for (const r of section.table.rows) {
          if (doc.y > doc.page.height - 60) doc.addPage();
          const y = doc.y;
          r.forEach((cell, i) => doc.text(t(cell), left + i * colW, y, { width: colW - 6 }));
          doc.y = y + 13;
        }
      }

      if (section.notes) {
        doc.moveDown(0.2);
        for (const n of section.notes) {
          if (doc.y > doc.page.height - 70) doc.addPage();
          doc.font('Helvetica').fontSize(9).fillColor(INK).text(t(`• ${n.text}`), left, doc.y, { width });
          doc.font('Helvetica-Oblique').fontSize(7.5).fillColor(MUTED).text(t(`  Source: ${n.source}`), left, doc.y, { width });
          doc.moveDown(0.15);
        }
      }

      if (section.list) {
        section.list.forEach((item) => {
          if (doc.y > doc.page.height - 70) doc.addPage();
          doc.font('Helvetica').fontSize(9).fillColor(INK).text(t(`[ ]  ${item}`), left, doc.y, { width });
          doc.moveDown(0.15);
        });
      }

      if (section.caution) {
        const note = safetyNotes[section.caution];
        doc.moveDown(0.2);
        doc.font('Helvetica-Bold').fontSize(9).fillColor(CAUTION).text(t(`${note.title}. `), left, doc.y, { width, continued: true });
        doc.font('Helvetica').text(t(note.body));
      }
      doc.moveDown(0.9);
    }

    const range = doc.bufferedPageRange();
    for (let i = range.start; i < range.start + range.count; i++) {
      doc.switchToPage(i);
      const bottom = doc.page.margins.bottom;
      doc.page.margins.bottom = 0;
      doc
        .font('Helvetica')
        .fontSize(7.5)
        .fillColor(MUTED)
        .text(
          t(`${input.designName} · page ${i - range.start + 1} of ${range.count} · estimates, not safety certification: local codes and licensed practice come first`),
          left,
          doc.page.height - 30,
          { width, align: 'center', lineBreak: false },
        );
      doc.page.margins.bottom = bottom;
    }
    doc.end();
  });
}
