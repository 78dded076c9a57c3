import { keyFigures, figureValue, showFigure } from './figures';
import { flatten, formatInput, inputLabel } from './inputs';
import { siUnitOfDisplay } from '../format/quantity';
import type { FigureChange, InputChange } from '../api/contracts/revisions';

export type { InputChange, FigureChange };

/** What changed between two designs' inputs, and what that did to the key results. */
export function compareDesigns(a: { design: unknown; result: unknown }, b: { design: unknown; result: unknown }) {
  const fa = flatten(a.design);
  const fb = flatten(b.design);
  const paths = [...new Set([...fa.keys(), ...fb.keys()])].sort();
  const inputs: InputChange[] = [];
  for (const p of paths) {
    const va = fa.get(p);
    const vb = fb.get(p);
    if (JSON.stringify(va) === JSON.stringify(vb)) continue;
    inputs.push({ path: p, label: inputLabel(p), from: formatInput(p, va), to: formatInput(p, vb) });
  }
  const figures: FigureChange[] = keyFigures.map((f) => {
    const from = figureValue(a.result, f);
    const to = figureValue(b.result, f);
    const relative = from !== null && to !== null && from !== 0 ? (to - from) / Math.abs(from) : null;
    return { key: f.key, label: f.label, unit: siUnitOfDisplay(f.kind), from, to, fromText: showFigure(f, from), toText: showFigure(f, to), relative, changed: from !== to };
  });
  return { inputs, figures };
}
