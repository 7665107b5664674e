/** Loads a simulation fixture budget as a planar Monte Carlo model. Not a test file itself. */
import { fileURLToPath } from 'node:url';
import { loadBudget } from '../../src/cli/load-budget';
import { planarSimulation } from '../../src/simulation/planar-study';
import type { PlanarSimulation } from '../../src/simulation/planar-simulation';

/** Path of test/fixtures/simulation/<name>.json. */
export const fixturePath = (name: string): string => fileURLToPath(new URL(`../fixtures/simulation/${name}.json`, import.meta.url));

/** The model of a fixture budget. */
export function fixtureModel(name: string): PlanarSimulation {
  return planarSimulation(loadBudget(fixturePath(name)).sheet.input!);
}
