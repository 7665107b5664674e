import type { BudgetDocument } from '../src';
import orchard from '../budgets/orchard-rover.json';
import harbour from '../budgets/harbour-launch.json';
import warehouse from '../budgets/warehouse-tug.json';
import annotated from '../budgets/annotated-example.json';
import surveyDrone from '../budgets/survey-drone.json';

/** The bundled example budgets (invented scenarios), in menu order; the first is the demo loaded on a first visit. */
export const EXAMPLES: { fileName: string; document: BudgetDocument }[] = [
  { fileName: 'orchard-rover.json', document: orchard as unknown as BudgetDocument },
  { fileName: 'harbour-launch.json', document: harbour as unknown as BudgetDocument },
  { fileName: 'warehouse-tug.json', document: warehouse as unknown as BudgetDocument },
  { fileName: 'annotated-example.json', document: annotated as unknown as BudgetDocument },
  // 3-D (inertial) examples: the store holds them as they are; the page opens them in the 3-D editors.
  { fileName: 'survey-drone.json', document: surveyDrone as unknown as BudgetDocument },
];
