import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { SENSOR_KIND_NAMES, SENSOR_KINDS } from '../../src/sensors/registry';
import { SOURCE_KIND_NAMES, SOURCE_KINDS } from '../../src/sources/registry';
import { QUANTITIES } from '../../src/inputs/quantities';

/**
 * The contributor guide's recipe (DEVELOPERS.md, "Adding a sensor kind"): a
 * new kind is one file in src/sensors/ (plus its line in the registry) and
 * one test. These checks fail when some other file keeps its own list of
 * kinds, or when a kind's file is not registered.
 */

function filesUnder(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? filesUnder(path) : path.endsWith('.ts') ? [path] : [];
  });
}

// Generated files (the schema validator) are written from the schema, whose enums come from the registries (npm run schema).
const CODE = [...filesUnder('src'), ...filesUnder('web')].filter((f) => !f.endsWith('.generated.ts'));

/** Files other than the kind's own and the registry that spell `kind` as a string literal or an object key. */
function otherFilesNaming(kind: string, own: string[]): string[] {
  const literal = new RegExp(`(['"])${kind}\\1|^\\s*${kind}:`, 'm');
  // The 3-D model (src/inertial/) has kinds of its own, some with the same names (a GNSS receiver is one in both).
  return CODE.filter((f) => !own.includes(f) && !f.startsWith('src/inertial/')).filter((f) =>
    // `observables: 'range-bearing'` is a value of that setting, not the sensor kind.
    readFileSync(f, 'utf8').split('\n').some((line) => !line.includes('observables') && literal.test(line)));
}

describe('a sensor kind is one file plus one test', () => {
  it('every sensor kind file is in the registry, under its own name', () => {
    const kindFiles = filesUnder('src/sensors').filter((f) => readFileSync(f, 'utf8').includes('defineSensorKind({'));
    expect(kindFiles.length).toBe(SENSOR_KIND_NAMES.length);
    for (const k of SENSOR_KIND_NAMES) expect(SENSOR_KINDS[k].kind).toBe(k);
  });

  it('the compass is named in no other file of the engine or the page: its file declares all the rest needs', () => {
    expect(otherFilesNaming('compass', ['src/sensors/compass.ts', 'src/sensors/registry.ts'])).toEqual([]);
    expect(readFileSync('test/sensors/compass.test.ts', 'utf8')).toContain("kind: 'compass'");
  });

  it('so is every other sensor kind', () => {
    for (const k of SENSOR_KIND_NAMES) {
      expect(otherFilesNaming(k, [`src/sensors/${k}.ts`, 'src/sensors/registry.ts']), k).toEqual([]);
    }
  });

  it("each kind's rows take only dimensions their source kind allows, and its defaults are usable", () => {
    for (const k of SENSOR_KIND_NAMES) {
      const spec = SENSOR_KINDS[k];
      expect(spec.defaults.id, k).toMatch(/^[A-Za-z][A-Za-z0-9_]*$/);
      expect(spec.defaults.rateHz, k).toBeGreaterThan(0);
      expect(spec.role === 'aiding', `${k}: aiding sensors and only they declare measurements`).toBe(spec.measurements.length > 0);
      for (const [source, dims] of Object.entries(spec.rows)) {
        const allowed = SOURCE_KINDS[source as keyof typeof SOURCE_KINDS].parameters.find((p) => p.field === 'value')!.dimensions;
        expect(allowed, `${k} ${source}`).toEqual(expect.arrayContaining([...dims!]));
      }
    }
  });

  it('every source kind names its own row id stem, and every quantity has one spelling', () => {
    expect(new Set(SOURCE_KIND_NAMES.map((k) => SOURCE_KINDS[k].idBase)).size).toBe(SOURCE_KIND_NAMES.length);
    const spellings = QUANTITIES.flatMap((q) => [q.id, ...('resultKey' in q ? [q.resultKey] : [])]);
    // The short result keys (`cross`) are the JSON result's, declared beside the id; no two quantities share a spelling.
    expect(new Set(spellings).size).toBe(spellings.length - QUANTITIES.filter((q) => 'resultKey' in q && q.resultKey === q.id).length);
  });
});
