/**
 * `npm run bench`: the sheet's cost, full evaluation against a one-cell update of
 * a kept workbook (why the page's ViewSession keeps one workbook between edits).
 * Target: an update well under a full evaluation (it was a timed test; timings
 * live here now).
 */
import { readFileSync } from 'node:fs';
import { parseBudgetDocument } from '../../src/document';
import { BudgetWorkbook, evaluateBudgetDocument } from '../../src/sheet';
import { medianMs } from './median-time';

const text = readFileSync(new URL('../../budgets/annotated-example.json', import.meta.url), 'utf8');
const { document } = parseBudgetDocument(text, 'annotated-example.json');

const fullMs = medianMs(() => evaluateBudgetDocument(document), 9, 2);
const workbook = new BudgetWorkbook(document);
let speed = 2;
const updateMs = medianMs(() => {
  workbook.setCell('values.cruiseSpeed.value', (speed += 0.1));
  workbook.evaluate();
}, 9, 2);
workbook.destroy();

console.log('sheet of annotated-example.json, median of 9:');
console.log(`  full evaluation      ${fullMs.toFixed(2)} ms`);
console.log(`  one-cell update      ${updateMs.toFixed(2)} ms  (${(fullMs / updateMs).toFixed(1)}x cheaper)${updateMs < fullMs ? '' : '  NOT cheaper: target missed'}`);
