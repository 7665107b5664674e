/**
 * A document whose cells are all numbers is evaluated without building
 * HyperFormula's engine (src/sheet/budget-workbook.ts): it must give exactly
 * what the engine gives, and the engine must appear when a formula is set.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseBudgetDocument } from '../../src/document';
import type { BudgetDocument } from '../../src/document/budget-document';
import { BudgetWorkbook } from '../../src/sheet';
import { listCells } from '../../src/sheet/cell-list';
import { minimalDocument } from '../document/minimal-document';

const BUDGETS = new URL('../../budgets/', import.meta.url);

/** Each bundled planar budget (3-D ones have a workbook of their own) with every formula replaced by the number the engine computes for it (cells in error kept). */
function frozenBudgets(): [string, BudgetDocument][] {
  return readdirSync(BUDGETS)
    .filter((f) => f.endsWith('.json') && !f.includes('schema'))
    .filter((f) => (JSON.parse(readFileSync(new URL(f, BUDGETS), 'utf8')) as { model?: string }).model !== 'inertial')
    .map((f) => {
    const doc = parseBudgetDocument(readFileSync(new URL(f, BUDGETS), 'utf8'), f).document;
    const wb = new BudgetWorkbook(doc);
    const values = wb.evaluate().cellValues;
    wb.destroy();
    for (const c of listCells(doc)) {
      const v = values.get(c.location.path);
      if (typeof c.quantity.value === 'string' && v !== undefined) c.quantity.value = v;
    }
    return [f, doc];
  });
}

/** The evaluation of a document with the engine built or not. */
function evaluated(doc: BudgetDocument, engine: 'always' | 'for-formulas') {
  const wb = new BudgetWorkbook(doc, { engine });
  try {
    return wb.evaluate();
  } finally {
    wb.destroy();
  }
}

describe('a workbook without formulas', () => {
  it('gives the engine\'s evaluation for every bundled budget with its formulas frozen to numbers', () => {
    const frozen = frozenBudgets();
    expect(frozen.length).toBeGreaterThanOrEqual(3);
    for (const [name, doc] of frozen) {
      expect(listCells(doc).some((c) => typeof c.quantity.value === 'string'), name).toBe(false);
      expect(evaluated(doc, 'for-formulas'), name).toEqual(evaluated(doc, 'always'));
    }
  });

  it('gives the engine\'s cell errors for bad content and bad units', () => {
    const doc = minimalDocument();
    for (const c of listCells(doc)) if (typeof c.quantity.value === 'string') c.quantity.value = 1;
    const cells = listCells(doc);
    (cells[3].quantity as { value: unknown }).value = true;
    cells[5].quantity.unit = 'furlong';
    const without = evaluated(doc, 'for-formulas');
    expect(without.cellErrors.map((e) => e.location.path)).toEqual([cells[3].location.path, cells[5].unitPath]);
    expect(without).toEqual(evaluated(doc, 'always'));
  });

  it('builds the engine when a formula is set, and the formula sees the numbers set before', () => {
    const doc = minimalDocument();
    for (const c of listCells(doc)) if (typeof c.quantity.value === 'string') c.quantity.value = 2;
    const wb = new BudgetWorkbook(doc);
    try {
      wb.setCell('values.cruiseSpeed.value', 3);
      wb.setCell('mission.segments[0].speed.value', '=cruiseSpeed*1.5');
      expect(wb.evaluate().input!.mission.segments[0].speed.value).toBe(4.5);
    } finally {
      wb.destroy();
    }
  });
});
