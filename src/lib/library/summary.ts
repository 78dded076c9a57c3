import { DESIGN_PARTS } from '../design/registry';
import type { Result } from '../../solver/types';
import { figureValue, LIBRARY_DIGITS, showFigure } from './figures';
import { resultFigure, type ResultFigureId } from '../design/figures';
import { LEAD_FIGURES, RESULT_GROUPS } from '../design/figure-groups';
import { formatTurns } from '../format/number';
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
  calibrated?: CalibratedTap;
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

/** The tap for values adopted on the bench; shown as the answer, with the prediction beside it. */
export type CalibratedTap = { tapTurns: number | null; targetFrequency: number } | null;

function tapText(result: unknown, calibrated: CalibratedTap | undefined): string | null {
  const f = resultFigure('tapTurns');
  const predicted = figureValue(result, f);
  if (calibrated) {
    const cal = calibrated.tapTurns === null ? 'out of reach' : formatTurns(calibrated.tapTurns);
    return `${cal} (from the bench measurement; predicted ${predicted === null ? 'out of reach' : formatTurns(predicted)})`;
  }
  if (predicted === null) return typedResult(result)?.tuning ? 'out of reach' : null;
  return showFigure(f, predicted);
}

/**
 * The summary's sections as label/value rows: the figures that decide the build, the result groups of
 * `RESULT_GROUPS` (what to buy, to set, to expect when measuring, what can hurt), measured values, and the
 * inputs as given by part.
 */
export function summaryBlocks(s: Pick<SummaryInput, 'design' | 'result' | 'measured' | 'calibrated'>): SummaryBlock[] {
  const out: SummaryBlock[] = [];
  const row = (key: ResultFigureId): Array<[string, string]> => {
    const f = resultFigure(key);
    if (key === 'tapTurns') {
      const t = tapText(s.result, s.calibrated);
      return t === null ? [] : [[f.label, t]];
    }
    const v = figureValue(s.result, f);
    return v === null ? [] : [[f.label, showFigure(f, v)]];
  };
  const lead = LEAD_FIGURES.flatMap(row);
  if (lead.length === 0) out.push({ title: 'Decides the build', rows: [['Results', 'none: the design needs attention']] });
  else out.push({ title: 'Decides the build', rows: lead });
  for (const g of RESULT_GROUPS) {
    const rows = g.figures.flatMap(row);
    if (rows.length) out.push({ title: g.title, rows });
  }
  if (s.measured.length) {
    out.push({
      title: 'Measured',
      rows: s.measured.map((m) => [
        humanKind(m.kind),
        [formatSi(m.value, m.unit, LIBRARY_DIGITS), m.measuredAt.slice(0, 10), m.instrument, m.notes].filter(Boolean).join(' · '),
      ]),
    });
  }
  const flat = flatten(s.design);
  for (const { key, title } of DESIGN_PARTS) {
    const rows: Array<[string, string]> = [];
    for (const [path, value] of flat) {
      if (path !== key && !path.startsWith(`${key}.`)) continue;
      rows.push([inputLabel(path), value === null ? 'none' : formatInput(path, value)]);
    }
    if (rows.length) out.push({ title: `Input: ${title}`, rows });
  }
  return out;
}

const caution =
  'Caution: the tank capacitor holds a charge that can kill, also after the supply is off; ground and discharge it before touching. Follow local electrical codes.';

/** The one-line header: the design and the figures that decide the build. */
export function keyFiguresLine(s: SummaryInput): string {
  const r = s.result;
  const parts: string[] = [];
  const tap = tapText(r, s.calibrated);
  if (tap !== null) parts.push(`tap ${tap}`);
  for (const key of LEAD_FIGURES.filter((k) => k !== 'tapTurns')) {
    const f = resultFigure(key);
    const v = figureValue(r, f);
    if (v !== null) parts.push(`${(f.short ?? f.label).toLowerCase()} ${showFigure(f, v)}`);
  }
  const head = `${s.name} (revision ${s.revision}, ${s.updatedAt.slice(0, 10)})`;
  return parts.length ? `${head}: ${parts.join(' · ')}` : `${head}: no results, the design needs attention`;
}

const cell = (t: string) => t.replace(/\|/g, '\\|').replace(/\n/g, ' ');

/**
 * A spec block to paste into a forum post asking for review: a one-line header with the key figures, then one
 * Markdown table grouped as the results panel is (group, figure, value). The text format is the same table
 * without Markdown emphasis, so it reads in a plain-text box as well.
 */
export function designSummary(s: SummaryInput, format: SummaryFormat): string {
  const bs = summaryBlocks(s);
  const hasTank = typeof typedResult(s.result)?.tank?.capacitance === 'number';
  const header = keyFiguresLine(s);
  const lines: string[] = [format === 'markdown' ? `**${header.replace(/([\\`*_#[\]])/g, '\\$1')}**` : header, ''];
  lines.push('| Group | Figure | Value |', '|---|---|---|');
  for (const b of bs) {
    b.rows.forEach(([k, v], i) => lines.push(`| ${i === 0 ? cell(b.title) : ''} | ${cell(k)} | ${cell(v)} |`));
  }
  lines.push('');
  if (hasTank) lines.push(format === 'markdown' ? `> ${caution}` : caution, '');
  if (s.url) lines.push(format === 'markdown' ? `[Open the design](${s.url})` : s.url, '');
  lines.push(format === 'markdown' ? '_Predictions from a lumped model; measured values win._' : 'Predictions from a lumped model; measured values win.');
  return lines.join('\n') + '\n';
}
