import { describe, expect, it } from 'vitest';
import { safeNext } from '~/lib/safe-next';

describe('safeNext', () => {
  it('safeNext keeps a path on this site with its query and hash', () => {
    expect(safeNext('/designs/abc?tab=history#rev-3', '/')).toBe('/designs/abc?tab=history#rev-3');
  });

  it('safeNext falls back for another host, a backslash or a control character', () => {
    for (const raw of ['//evil.example/x', 'https://evil.example/', '/\\evil.example', '/a\u0000b', '/a\tb', '/a\u001fb', '/a\u007fb', '', null, undefined]) {
      expect(safeNext(raw, '/library'), JSON.stringify(raw)).toBe('/library');
    }
  });
});
