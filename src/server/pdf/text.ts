/**
 * The standard PDF fonts (Helvetica here) only cover WinAnsi; characters outside it would print as
 * garbage, so they are spelled out. Characters WinAnsi has (µ × ° ½ ² – — ’ “ ”) stay.
 */
const REPLACEMENTS: Array<[RegExp, string]> = [
  [/Ω/g, 'ohm'],
  [/≥/g, '>='],
  [/≤/g, '<='],
  [/≈/g, '~'],
  [/√/g, 'sqrt'],
  [/π/g, 'pi'],
  [/ω/g, 'w'],
  [/±/g, '+/-'],
  [/→/g, '->'],
  [/−/g, '-'],
  [/\u202f|\u2009|\u2007/g, ' '],
  [/³/g, '^3'],
];

export function winAnsi(text: string): string {
  let out = text;
  for (const [re, to] of REPLACEMENTS) out = out.replace(re, to);
  // anything else outside Latin-1 and the WinAnsi extras becomes '?'
  return out.replace(/[^\x20-\x7e\xa0-\xff\u2013\u2014\u2018\u2019\u201c\u201d\u2022\u2026\u20ac\n]/g, '?');
}
