import { describe, expect, it } from 'vitest';
import * as engine from '../src/index';
import { scenarioR1 } from './fixtures/reference-scenarios';

describe('the public API', () => {
  it('imports under bare Node and exposes the pipeline', () => {
    expect(typeof engine.computeBudget).toBe('function');
    expect(typeof engine.sizeSource).toBe('function');
    expect(typeof engine.toSI).toBe('function');
    expect(Object.keys(engine.SOURCE_KINDS)).toContain('bias-instability');
    expect(Object.keys(engine.SENSOR_KINDS)).toContain('range-bearing');
  });

  it('returns plain data that survives a structured clone (what a web worker sends)', () => {
    const r = engine.computeBudget(scenarioR1());
    const { series, requirements, checkpoints } = r;
    expect(() => structuredClone({ series, requirements, checkpoints })).not.toThrow();
  });
});
