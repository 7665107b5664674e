import type { BudgetDocument } from '../src';
import orchard from '../budgets/orchard-rover.json';
import harbour from '../budgets/harbour-launch.json';
import warehouse from '../budgets/warehouse-tug.json';
import annotated from '../budgets/annotated-example.json';

/** The bundled example budgets (invented scenarios), in menu order; the first is the demo loaded on a first visit. */
export const EXAMPLES: { fileName: string; document: BudgetDocument }[] = [
  { fileName: 'orchard-rover.json', document: orchard as unknown as BudgetDocument },
  { fileName: 'harbour-launch.json', document: harbour as unknown as BudgetDocument },
  { fileName: 'warehouse-tug.json', document: warehouse as unknown as BudgetDocument },
  { fileName: 'annotated-example.json', document: annotated as unknown as BudgetDocument },
];
