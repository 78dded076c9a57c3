/**
 * The one rule for reading a number as people type it: digit grouping ("1,000", "1 000", "1'000") and a
 * decimal comma ("0,5") are read as meant, and text that could mean two values is refused, never cut short.
 *
 * - Grouping marks: a comma or a point between groups of exactly three digits, and the thin, narrow or
 *   no-break space or an apostrophe between such groups. Two or more marks of one kind are always grouping.
 * - With a comma and a point both present, the last one is the decimal mark ("1,234.5", "1.234,5").
 * - One comma or one point followed by one, two or four or more digits is the decimal mark ("0,5", "12.25").
 * - One comma or one point followed by exactly three digits ("1,000", "2.500") is read by the locale's own
 *   decimal mark: the locale's mark is the decimal mark, the other one groups thousands. Where no locale is
 *   known (the API), the decimal mark is the point.
 */

export type DecimalMark = '.' | ',';

export type NumberRead = { ok: true; value: number; text: string } | { ok: false; message: string };

/** The rule in one line, stated beside the number fields of the forms. */
export const NUMBER_RULE_TEXT = 'Digits may be grouped (1,000 or 1 000); a decimal comma (0,5) reads as 0.5.';

// a number format is slow to build and a locale's mark never changes: each locale is asked once
const marks = new Map<string, DecimalMark>();

/** The decimal mark of a locale ("en-GB" → ".", "de-DE" → ","); the point for an unknown one. */
export function decimalMarkOf(locale: string | undefined): DecimalMark {
  if (!locale) return '.';
  const known = marks.get(locale);
  if (known) return known;
  let mark: DecimalMark = '.';
  try {
    const part = new Intl.NumberFormat(locale).formatToParts(1.5).find((p) => p.type === 'decimal');
    mark = part?.value === ',' ? ',' : '.';
  } catch {
    mark = '.';
  }
  marks.set(locale, mark);
  return mark;
}

/** The decimal mark of the browser's language; the point where there is no browser (the server renders with it). */
export function browserDecimalMark(): DecimalMark {
  return typeof navigator !== 'undefined' && typeof navigator.language === 'string' ? decimalMarkOf(navigator.language) : '.';
}

const GROUP_SPACES = /[\u00a0\u202f\u2009 '’]/;
/** The leading number of a text: digits with grouping or decimal marks, or a mark and digits. */
export const NUMBER_TOKEN = /^[-+]?(?:\d(?:[\d.,'’\u00a0\u202f\u2009]|\s(?=\d{3}(?!\d)))*|[.,]\d+)/;

const grouped = (s: string, mark: DecimalMark) => (mark === ',' ? /^\d{1,3}(?:,\d{3})+$/ : /^\d{1,3}(?:\.\d{3})+$/).test(s);

/**
 * Reads the number at the start of a text ("1,000", "0,5", "-12.5", "1 000") with the rule above; null when
 * the text does not start with a number. `rest` is what follows the number (a unit, an exponent).
 */
export function readLeadingNumber(text: string, decimal: DecimalMark = '.'): { read: NumberRead; rest: string } | null {
  const t = text.trim();
  const m = NUMBER_TOKEN.exec(t);
  if (!m) return null;
  let token = m[0];
  let rest = t.slice(token.length);
  // a trailing mark belongs to no digits after it ("12," or "5.") : keep it with the number only if nothing follows
  const trailing = /[,'’\u00a0\u202f\u2009\s]+$/.exec(token);
  if (trailing && rest !== '') {
    token = token.slice(0, -trailing[0].length);
    rest = t.slice(token.length);
  }
  return { read: readNumberToken(token, decimal), rest };
}

/** Reads a whole text as a number with the rule above; null when it is not a number at all. */
export function readNumberText(text: string, decimal: DecimalMark = '.'): NumberRead | null {
  const lead = readLeadingNumber(text, decimal);
  if (!lead) return null;
  if (/^e[-+]?\d+$/i.test(lead.rest) && lead.read.ok) {
    const value = Number(`${lead.read.text}${lead.rest}`);
    return Number.isFinite(value) ? { ok: true, value, text: `${lead.read.text}${lead.rest.toLowerCase()}` } : null;
  }
  return lead.rest === '' ? lead.read : null;
}

function readNumberToken(token: string, decimal: DecimalMark): NumberRead {
  const original = token.trim();
  const sign = /^[-+]/.test(original) ? original[0] : '';
  let body = original.slice(sign.length);
  const refuse = (why: string): NumberRead => ({ ok: false, message: `"${original}" ${why}` });

  // spaces and apostrophes only ever group digits
  if (GROUP_SPACES.test(body)) {
    const parts = body.split(/[\s'’\u00a0\u202f\u2009]/);
    const [head, ...tail] = parts;
    const lastTail = tail[tail.length - 1] ?? '';
    const decimalAt = lastTail.search(/[.,]/);
    const groups = [...tail.slice(0, -1), decimalAt >= 0 ? lastTail.slice(0, decimalAt) : lastTail];
    if (!/^\d{1,3}$/.test(head) || groups.some((g) => !/^\d{3}$/.test(g))) return refuse('has digits grouped in other than threes');
    body = head + groups.join('') + (decimalAt >= 0 ? lastTail.slice(decimalAt) : '');
  }

  const commas = (body.match(/,/g) ?? []).length;
  const points = (body.match(/\./g) ?? []).length;
  let plain: string;
  if (commas > 0 && points > 0) {
    const last = body.lastIndexOf(',') > body.lastIndexOf('.') ? ',' : '.';
    const group: DecimalMark = last === ',' ? '.' : ',';
    const [whole, frac, ...more] = body.split(last);
    if (more.length > 0 || !grouped(whole, group)) return refuse('mixes commas and points in a way that reads two ways');
    plain = `${whole.split(group).join('')}.${frac}`;
  } else if (commas + points > 1) {
    const mark: DecimalMark = commas > 0 ? ',' : '.';
    if (!grouped(body, mark)) return refuse(`has more than one "${mark}"`);
    plain = body.split(mark).join('');
  } else if (commas + points === 1) {
    const mark = commas > 0 ? ',' : '.';
    const [whole, frac] = body.split(mark);
    const couldGroup = /^[1-9]\d{0,2}$/.test(whole) && /^\d{3}$/.test(frac);
    plain = couldGroup && mark !== decimal ? whole + frac : `${whole || '0'}.${frac}`;
  } else {
    plain = body;
  }
  if (!/^\d+(?:\.\d*)?$|^\.\d+$/.test(plain)) return refuse('is not a number');
  const text = `${sign === '-' ? '-' : ''}${plain.replace(/\.$/, '')}`;
  const value = Number(text);
  return Number.isFinite(value) ? { ok: true, value, text } : refuse('is not a finite number');
}

/**
 * The text with its leading number rewritten by the rule ("1,000 mm" → "1000 mm", "0,5 in" → "0.5 in");
 * unchanged when it has no leading number or the number is refused (the reader then names the problem).
 */
export function canonicalNumberText(text: string, decimal: DecimalMark = '.'): string {
  const lead = readLeadingNumber(text, decimal);
  if (!lead || !lead.read.ok) return text.trim();
  return `${lead.read.text}${lead.rest}`;
}
