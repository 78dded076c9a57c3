import { DESIGN_PARTS } from '../design/registry';
import type { Result } from '../../solver/types';
import { figureValue, keyFigures, LIBRARY_DIGITS, showFigure } from './figures';
import { flatten, formatInput, inputLabel } from './inputs';
import { formatSi } from '../format/si';

export type Measured = { kind: string; value: number; unit: string; measuredAt: string; instrument: string | null; notes: string | null };
export type SummaryInput = {
  name: string;
  revision: number;
  updatedAt: string;
  design: unknown;
  result: unknown;
  measured: Measured[];
  url?: string | null;
};
export type SummaryFormat = 'text' | 'markdown';


function humanKind(kind: string): string {
  const s = kind.replace(/([a-z])([A-Z])/g, '$1 $2').replace(/[_-]+/g, ' ').toLowerCase();
  return s.charAt(0).toUpperCase() + s.slice(1);
}

/** A stored result as the solver's type; its sections may be missing, so read it with `?.`. */
function typedResult(result: unknown): Partial<Result> | null {
  return result !== null && typeof result === 'object' ? (result as Partial<Result>) : null;
}

export type SummaryBlock = { title: string; rows: Array<[string, string]> };

/** The summary's sections as label/value rows: inputs as given, predicted results, measured values. */
export function summaryBlocks(s: Pick<SummaryInput, 'design' | 'result' | 'measured'>): SummaryBlock[] {
  const flat = flatten(s.design);
  const out: SummaryBlock[] = [];
  for (const { key, title } of DESIGN_PARTS) {
    const rows: Array<[string, string]> = [];
    for (const [path, value] of flat) {
      if (path !== key && !path.startsWith(`${key}.`)) continue;
      rows.push([inputLabel(path), value === null ? 'none' : formatInput(path, value)]);
    }
    if (rows.length) out.push({ title, rows });
  }
  const results: Array<[string, string]> = [];
  for (const f of keyFigures) {
    const v = figureValue(s.result, f);
    if (v === null) continue;
    results.push([f.label, showFigure(f, v)]);
  }
  if (typedResult(s.result)?.tuning?.inRange === false) results.push(['Tap', 'the primary cannot reach the target frequency']);
  out.push({ title: 'Predicted (Coilwright)', rows: results.length ? results : [['Results', 'none: the design needs attention']] });
  if (s.measured.length) {
    out.push({
      title: 'Measured',
      rows: s.measured.map((m) => [
        humanKind(m.kind),
        [formatSi(m.value, m.unit, LIBRARY_DIGITS), m.measuredAt.slice(0, 10), m.instrument, m.notes].filter(Boolean).join(' · '),
      ]),
    });
  }
  return out;
}

const caution =
  'Caution: the tank capacitor holds a charge that can kill, also after the supply is off; ground and discharge it before touching. Follow local electrical codes.';

/** A spec block to paste into a forum post asking for review, as plain text or Markdown. */
export function designSummary(s: SummaryInput, format: SummaryFormat): string {
  const bs = summaryBlocks(s);
  const hasTank = typeof typedResult(s.result)?.tank?.capacitance === 'number';
  const lines: string[] = [];
  if (format === 'markdown') {
    lines.push(`## ${s.name.replace(/([\\`*_#[\]])/g, '\\$1')}`, '', `Revision ${s.revision}, ${s.updatedAt.slice(0, 10)}`, '');
    for (const b of bs) {
      lines.push(`**${b.title}**`, '', '| | |', '|---|---|');
      for (const [k, v] of b.rows) lines.push(`| ${k.replace(/\|/g, '\\|')} | ${v.replace(/\|/g, '\\|')} |`);
      lines.push('');
    }
    if (hasTank) lines.push(`> ${caution}`, '');
    if (s.url) lines.push(`[Open the design](${s.url})`, '');
    lines.push('_Predictions from a lumped model; measured values win._');
  } else {
    lines.push(s.name, `Revision ${s.revision}, ${s.updatedAt.slice(0, 10)}`, '');
    const width = Math.min(48, Math.max(...bs.flatMap((b) => b.rows.map(([k]) => k.length))));
    for (const b of bs) {
      lines.push(b.title.toUpperCase());
      for (const [k, v] of b.rows) lines.push(`  ${k.padEnd(width)}  ${v}`);
      lines.push('');
    }
    if (hasTank) lines.push(caution, '');
    if (s.url) lines.push(s.url, '');
    lines.push('Predictions from a lumped model; measured values win.');
  }
  return lines.join('\n') + '\n';
}
