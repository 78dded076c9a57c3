import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { z } from 'zod';
import { designInputSchema, parseDesign, DESIGN_FIELDS, RESULT_FIGURES, findDesignField, pathsOfKind } from '~/lib/design';
import { solve as solveSI, type Result } from '~/solver';
import { emptyValues, toDesignInput, LENGTH_PATHS, type FormValues } from '~/islands/designer/form/values';
import { figureOf } from '~/lib/design/figures';
import { siUnitOf } from '~/lib/design/registry';

/** Solves a design input that must be valid. */
function solve(input: unknown): Result {
  const p = parseDesign(input);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return solveSI(p.design);
}

type Leaf = { path: string; optional: boolean; values: Set<string> };

/** Every leaf of the zod design schema with whether it may be left out and, for words, the words it takes. */
function schemaLeaves(schema: z.core.$ZodType, path: string[] = [], optional = false, out = new Map<string, Leaf>()): Map<string, Leaf> {
  const def = schema._zod.def as unknown as Record<string, unknown> & { type: string };
  if (def.type === 'optional') return schemaLeaves(def.innerType as z.core.$ZodType, path, true, out);
  if (def.type === 'nullable') return schemaLeaves(def.innerType as z.core.$ZodType, path, optional, out);
  if (def.type === 'union') {
    for (const o of def.options as z.core.$ZodType[]) schemaLeaves(o, path, optional, out);
    return out;
  }
  if (def.type === 'object') {
    for (const [k, v] of Object.entries(def.shape as Record<string, z.core.$ZodType>)) schemaLeaves(v, [...path, k], false, out);
    return out;
  }
  const key = path.join('.');
  const leaf = out.get(key) ?? { path: key, optional, values: new Set<string>() };
  leaf.optional &&= optional;
  if (def.type === 'enum') for (const v of Object.values(def.entries as Record<string, string>)) leaf.values.add(v);
  if (def.type === 'literal') for (const v of def.values as string[]) leaf.values.add(v);
  out.set(key, leaf);
  return out;
}

const leaves = schemaLeaves(designInputSchema as unknown as z.core.$ZodType);

function setAt(o: Record<string, unknown>, path: string, value: unknown) {
  const parts = path.split('.');
  let cur = o;
  for (const p of parts.slice(0, -1)) cur = cur[p] as Record<string, unknown>;
  cur[parts[parts.length - 1]] = value;
}

/** Form values with every part switched on, in the variant that holds `path`. */
function valuesWith(system: 'metric' | 'imperial', path = ''): FormValues {
  const v = emptyValues(system);
  v.topload.shape = path === 'topload.diameter' ? 'sphere' : 'toroid';
  v.primary.enabled = true;
  v.primary.shape = path === 'primary.angle' ? 'conical' : 'flat';
  v.tank.mode = path.startsWith('tank.') && path !== 'tank.capacitance' ? 'bank' : 'single';
  const transformerPaths = ['supply.voltage', 'supply.current', 'supply.lineFrequency', 'supply.breakRate'];
  v.supply.kind = path.startsWith('supply.') && !transformerPaths.includes(path) ? 'solid-state' : 'transformer';
  if (path === 'supply.tuningRatio') v.supply.tuningRatio = '0.9';
  v.tuning.streamerMode = path === 'tuning.streamerLength' ? 'length' : 'capacitance';
  if (path.startsWith('secondary.wire.') && path !== 'secondary.wire.awg' && path !== 'secondary.wire.insulation') {
    v.secondary.wireMode = 'diameter';
    v.secondary.wire.diameter = '0.5 mm';
    v.secondary.wire.insulatedDiameter = '0.55 mm';
  }
  return v;
}

describe('DESIGN_FIELDS (the design field registry)', () => {
  it('DESIGN_FIELDS has exactly one entry for every leaf of the design schema, and no other', () => {
    const registry = DESIGN_FIELDS.map((f) => f.path);
    expect(new Set(registry).size, 'no path twice').toBe(registry.length);
    expect([...registry].sort()).toEqual([...leaves.keys()].sort());
  });

  it('DESIGN_FIELDS says a field is optional exactly when the schema lets it be left out', () => {
    for (const f of DESIGN_FIELDS) expect('optional' in f && f.optional === true, f.path).toBe(leaves.get(f.path)!.optional);
  });

  it('DESIGN_FIELDS offers exactly the words the schema takes for each choice', () => {
    for (const f of DESIGN_FIELDS.filter((x) => x.kind === 'choice')) {
      const options = 'options' in f ? f.options.map((o) => o.value) : [];
      expect(new Set(options), f.path).toEqual(leaves.get(f.path)!.values);
    }
  });

  it('DESIGN_FIELDS labels are unique, and every field has a label and a help text', () => {
    const labels = DESIGN_FIELDS.map((f) => f.label);
    expect(new Set(labels).size).toBe(labels.length);
    for (const f of DESIGN_FIELDS) {
      expect(f.label.length, f.path).toBeGreaterThan(2);
      expect(f.help.length, f.path).toBeGreaterThan(2);
    }
  });

  for (const system of ['metric', 'imperial'] as const) {
    for (const variant of ['', 'topload.diameter', 'primary.angle', 'tank.unitVoltage', 'supply.busVoltage', 'tuning.streamerLength', 'secondary.wire.diameter']) {
      it(`emptyValues("${system}") with every part on${variant ? ` (the variant with ${variant})` : ''} parses as a valid design`, () => {
        const r = parseDesign(toDesignInput(valuesWith(system, variant)));
        expect(r.ok, JSON.stringify(r)).toBe(true);
      });
    }
  }

  it('the schema rejects a value just beyond each registry bound, naming the field and the bound', () => {
    const outside = DESIGN_FIELDS.filter((f) => 'bounds' in f && f.kind !== 'gauge');
    expect(outside.length).toBeGreaterThan(25);
    for (const f of outside) {
      const b = f.bounds!;
      const unit = siUnitOf(f.kind);
      const over = b.max * 1.5 + 1;
      const v = valuesWith('metric', f.path) as unknown as Record<string, unknown>;
      setAt(v, f.path, unit ? `${over} ${unit}` : String(over));
      const r = parseDesign(toDesignInput(v as unknown as FormValues));
      expect(r.ok, f.path).toBe(false);
      if (!r.ok) {
        const issue = r.issues.find((i) => i.path === f.path);
        expect(issue?.message, `${f.path}: ${JSON.stringify(r.issues)}`).toContain(b.label);
      }
    }
  });

  it('LENGTH_PATHS, the fields the unit switch rewrites, are the registry lengths', () => {
    expect([...LENGTH_PATHS].sort()).toEqual(pathsOfKind('length').sort());
    expect(LENGTH_PATHS).toContain('secondary.formDiameter');
    expect(LENGTH_PATHS).not.toContain('secondary.turns');
    expect(findDesignField('nowhere.at.all')).toBeUndefined();
  });

  it("each design field's label is written once in src: in the registry, nowhere else", () => {
    const files: string[] = [];
    const walk = (dir: string) => {
      for (const name of readdirSync(dir)) {
        const p = join(dir, name);
        if (statSync(p).isDirectory()) walk(p);
        else if (/\.(ts|tsx|astro)$/.test(name)) files.push(p);
      }
    };
    walk('src');
    // the same words naming something else: results of the same name (the result figures, the build sheet's rows)
    // and the quantities of the validation reference cases
    const sameWordsOtherThing = new Set([
      'src/lib/design/figures.ts: Tank capacitance',
      'src/lib/buildsheet/sections.ts: Winding length',
      'src/lib/buildsheet/sections.ts: Tank capacitance',
      'src/lib/validation/cases-physics.ts: Bare wire diameter',
      'src/lib/validation/cases-system.ts: Streamer capacitance allowance',
    ]);
    const elsewhere: string[] = [];
    for (const file of files.filter((f) => !f.endsWith(join('lib', 'design', 'registry.ts')))) {
      const text = readFileSync(file, 'utf8');
      for (const f of DESIGN_FIELDS) {
        const asText = new RegExp(`>\\s*${f.label.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}\\s*<`);
        if (text.includes(`'${f.label}'`) || text.includes(`"${f.label}"`) || asText.test(text)) elsewhere.push(`${file}: ${f.label}`);
      }
    }
    expect(elsewhere.filter((e) => !sameWordsOtherThing.has(e))).toEqual([]);
  });
});

describe('RESULT_FIGURES (the result figure registry)', () => {
  const result = solve(toDesignInput(valuesWith('metric')));

  it('RESULT_FIGURES keys, paths and labels are unique', () => {
    for (const k of ['key', 'path', 'label'] as const) {
      const all = RESULT_FIGURES.map((f) => f[k]);
      expect(new Set(all).size, k).toBe(all.length);
    }
  });

  it('each figure accessor reads the number at its path of a solved design', () => {
    const at = (path: string) => path.split('.').reduce<unknown>((o, p) => (o as Record<string, unknown> | null)?.[p], result);
    let read = 0;
    for (const f of RESULT_FIGURES) {
      const v = figureOf(result, f);
      const raw = at(f.path);
      if (typeof raw === 'number' && f.key !== 'transferTime') {
        expect(v, f.key).toBe(raw);
        read++;
      }
    }
    expect(read).toBeGreaterThan(30);
    expect(figureOf({ system: null }, RESULT_FIGURES[0])).toBeNull();
    expect(figureOf(null, RESULT_FIGURES[0])).toBeNull();
  });
});
