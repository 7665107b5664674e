import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { parseBudgetDocument, type BudgetDocument } from '../../src/document';
import { computeView } from '../../src/report/view-result';
import { ViewSession } from '../../src/report/view-session';

const orchard = () => parseBudgetDocument(readFileSync('budgets/orchard-rover.json', 'utf8'), 'orchard').document;

/** A new version of `doc` changed by `edit`, as the page's store makes them. */
function edited(doc: BudgetDocument, edit: (d: BudgetDocument) => void): BudgetDocument {
  const next = structuredClone(doc);
  edit(next);
  return next;
}

describe('a view session that keeps the workbook between edits', () => {
  it('gives the same views as computing each version afresh, through cell, unit, formula and structural edits', () => {
    const session = new ViewSession();
    let doc = orchard();
    const versions: BudgetDocument[] = [doc];
    versions.push((doc = edited(doc, (d) => (d.sensors[0].sources[1].value = 40))));
    versions.push((doc = edited(doc, (d) => (d.values!.rowSpeed.value = '=1.5'))));
    versions.push((doc = edited(doc, (d) => (d.sensors[0].sources[0].unit = 'deg/√h'))));
    versions.push((doc = edited(doc, (d) => (d.sensors[0].sources[1].value = '=noSuchName'))));
    versions.push((doc = edited(doc, (d) => d.sensors[0].sources.pop())));
    versions.push(edited(doc, (d) => (d.sensors[0].sources[1].value = 4)));
    for (const [i, v] of versions.entries()) {
      const kept = session.view(v);
      const fresh = computeView(v);
      expect(kept.cellErrors, `version ${i}`).toEqual(fresh.cellErrors);
      expect(kept.cellValues, `version ${i}`).toEqual(fresh.cellValues);
      expect(kept.result?.series, `version ${i}`).toEqual(fresh.result?.series);
    }
  });
});
