/**
 * `--into BUDGET --sensor ID` for `allan` and `calibrate`: writes the rows a
 * log gives (with their origin as provenance) into one sensor of a budget
 * file, the same rows the page's "Sensor logs" tab writes. The file is
 * rewritten in the canonical layout; a bad budget or sensor leaves it as it was.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { basename } from 'node:path';
import { parseBudgetDocument, serializeBudgetDocument, type BudgetDocument } from '../document';
import { InputError } from '../errors';
import type { SensorKind } from '../inputs/budget-input';
import { writeRows, type RowPlan } from '../edits/row-writer';
import type { LogSource } from '../edits/provenance-text';
import { isoDate } from '../edits/provenance-text';
import { SENSOR_KINDS } from '../sensors/registry';

/** The options `--into` adds to the command line. */
export const INTO_CLI_OPTIONS = {
  into: { type: 'string' },
  sensor: { type: 'string' },
  terms: { type: 'string' },
} as const;

/** Where to write, as given on the command line. */
export interface IntoTarget {
  budgetFile: string;
  sensorId: string;
}

/** Reads `--into` and `--sensor` (both or neither). @throws InputError naming the missing option. */
export function intoTarget(values: Readonly<Record<string, string | boolean | undefined>>): IntoTarget | undefined {
  const budgetFile = typeof values.into === 'string' ? values.into : undefined;
  const sensorId = typeof values.sensor === 'string' ? values.sensor : undefined;
  if (!budgetFile && !sensorId) return undefined;
  if (!budgetFile) throw new InputError('--into', 'give the budget file to write into, e.g. --into budgets/orchard-rover.json');
  if (!sensorId) throw new InputError('--sensor', 'give the id of the sensor whose rows to write, e.g. --sensor gyro');
  return { budgetFile, sensorId };
}

/** Provenance facts of a log: its name, today's date and its sample count. */
export function logSource(fileName: string, samples: number): LogSource {
  return { fileName: basename(fileName), date: isoDate(new Date()), samples };
}

/** The budget and the index of the target sensor, checked against the kind the rows are for. */
export function openTarget(target: IntoTarget, kind: SensorKind | undefined): { doc: BudgetDocument; index: number } {
  let text: string;
  try {
    text = readFileSync(target.budgetFile, 'utf8');
  } catch (e) {
    throw new InputError(target.budgetFile, `cannot be read (${(e as NodeJS.ErrnoException).code ?? 'error'}); check the path given to --into`);
  }
  const { document } = parseBudgetDocument(text, target.budgetFile);
  const index = document.sensors.findIndex((s) => s.id === target.sensorId);
  if (index < 0) throw new InputError('--sensor', `no sensor "${target.sensorId}" in ${target.budgetFile}; it has ${document.sensors.map((s) => s.id).join(', ')}`);
  const sensor = document.sensors[index];
  if (kind === undefined) throw new InputError('--into', 'no sensor kind of a budget takes these terms (accelerometers are not in the planar model)');
  if (sensor.kind !== kind) throw new InputError('--sensor', `"${sensor.id}" is a ${SENSOR_KINDS[sensor.kind].label}; these rows belong in a ${SENSOR_KINDS[kind].label}`);
  return { doc: document, index };
}

/**
 * Writes `plans` into the target and saves the file.
 * @returns one line per row written.
 */
export function writePlans(target: IntoTarget, doc: BudgetDocument, index: number, plans: RowPlan[]): string[] {
  if (plans.length === 0) return [`nothing written into ${target.budgetFile}: no row could be made for sensor ${target.sensorId}`];
  const written = writeRows(doc, index, plans);
  try {
    writeFileSync(target.budgetFile, serializeBudgetDocument(doc));
  } catch (e) {
    throw new InputError(target.budgetFile, `cannot be written (${(e as NodeJS.ErrnoException).code ?? 'error'})`);
  }
  return [
    `written into ${target.budgetFile}, sensor ${target.sensorId}:`,
    ...written.map((w) => `  ${w.action} ${w.fullId} (${w.label}): ${w.value}${w.warnings?.length ? ` — ${w.warnings.join('; ')}` : ''}`),
  ];
}
