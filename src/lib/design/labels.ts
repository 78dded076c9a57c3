import { DESIGN_PARTS, findDesignField } from './registry';

const PART_TITLES = new Map<string, string>(DESIGN_PARTS.map((p) => [p.key, p.title]));
const OTHER_NAMES: Record<string, string> = {
  design: 'Design',
  name: 'Design name',
  strikeRail: 'Strike rail',
  'secondary.wire': 'Secondary wire',
  'secondary.former': 'Coil form',
  'tank.bank': 'Tank capacitor bank',
  file: 'File',
};

// a label never changes: each path is worked out once (up to a bound, as paths can come from requests)
const labels = new Map<string, string>();
const MAX_KEPT_LABELS = 2000;

/**
 * The name a person reads for a path of the design (a field path gives the label its input shows): the field's
 * label on screen, its part's heading for a part, and never the raw path. An API path may start with
 * "design." (a request body); array indexes are left out.
 */
export function fieldLabel(path: string | undefined | null): string {
  const key = path ?? '';
  let label = labels.get(key);
  if (label === undefined) {
    label = labelOf(key);
    if (labels.size < MAX_KEPT_LABELS) labels.set(key, label);
  }
  return label;
}

function labelOf(path: string): string {
  const p = path.replace(/^design\./, '').replace(/\.\d+(?=\.|$)/g, '');
  if (p === '' || p === 'design') return 'Design';
  const field = findDesignField(p);
  if (field) return field.label;
  if (OTHER_NAMES[p]) return OTHER_NAMES[p];
  if (PART_TITLES.has(p)) return PART_TITLES.get(p)!;
  // a path below a field (e.g. a part of a wire) takes its nearest named parent's name
  const parts = p.split('.');
  for (let n = parts.length - 1; n > 0; n--) {
    const parent = parts.slice(0, n).join('.');
    const f = findDesignField(parent);
    if (f) return f.label;
    if (OTHER_NAMES[parent]) return OTHER_NAMES[parent];
    if (PART_TITLES.has(parent)) return PART_TITLES.get(parent)!;
  }
  const last = parts[parts.length - 1];
  const words = last.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
}

/** Library wording a person should never read, turned into plain words. */
export function plainMessage(message: string): string {
  return message
    .replace(/^Invalid input: expected nonoptional, received undefined$/i, 'is required')
    .replace(/^Invalid input: expected (\w+), received undefined$/i, 'is required')
    .replace(/^Invalid input: expected (\w+), received (\w+)$/i, (_a, want: string, got: string) => `expected ${want === 'number' ? 'a number' : want === 'string' ? 'text' : `a ${want}`}, got ${got === 'string' ? 'text' : `a ${got}`}`)
    .replace(/^Invalid input$/i, 'is not in a form that can be read')
    .replace(/^Unrecognized keys?: /i, 'has a name this design format does not know: ')
    .replace(/^Required$/i, 'is required');
}

/** One issue as a sentence: the field's label, then the message ("Winding length: must be …"). */
export function issueText(issue: { path?: string | null; message: string }): string {
  return `${fieldLabel(issue.path)}: ${plainMessage(issue.message)}`;
}
