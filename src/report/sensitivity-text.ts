/**
 * Tables of the assumption sensitivity and of the R sweep, as `sigma-ledger
 * sensitivity` and `sigma-ledger r-sweep` print them.
 */
import type { SensitivityEntry } from '../sensitivity/assumption-sensitivity';
import type { RSweep } from '../suboptimal/r-sweep';
import { formatSignificant } from '../units';
import { CAUTION } from './caution';

const fmt = (x: number) => formatSignificant(x, 4);

/** The ranked sensitivity table, largest relative change first. Throws nothing. */
export function formatSensitivity(entries: SensitivityEntry[], range: [number, number]): string {
  const lines = [
    `SENSITIVITY: each value scaled from ×${fmt(range[0])} to ×${fmt(range[1])} on its own; change in each requirement's worst value, largest first`,
    `  ${'value'.padEnd(34)} ${'requirement'.padEnd(20)} ${'base'.padStart(10)} ${'at low'.padStart(10)} ${'at high'.padStart(10)} ${'largest change'.padStart(16)}`,
  ];
  for (const e of entries) {
    const low = e.byScale[0].worst, high = e.byScale[e.byScale.length - 1].worst;
    const name = `${e.target}${e.assumed ? '' : ' (picked)'}`;
    lines.push(`  ${name.padEnd(34)} ${e.requirementId.padEnd(20)} ${fmt(e.baseWorst).padStart(10)} ${fmt(low).padStart(10)} ${fmt(high).padStart(10)} ` +
      `${`${fmt(e.change)} ${e.unit}`.padStart(11)} (${(100 * e.relativeChange).toFixed(1)} %)`);
  }
  if (entries.length === 0) lines.push('  (no value is marked assumed; pick rows with --rows)');
  return [...lines, '', `CAUTION: ${CAUTION}`, ''].join('\n');
}

/** The R sweep table: actual and believed worst of each requirement per scale. Throws nothing. */
export function formatRSweep(sweep: RSweep): string {
  const ids = sweep.points[0]?.values.map((v) => `${v.requirementId} [${v.unit}]`) ?? [];
  const lines = [
    `R SWEEP of ${sweep.sensorId}'s R in the filter (other rows as tuned): worst value of each requirement, actual / believed`,
    `  ${'R scale'.padStart(8)}  ${ids.map((id) => id.padStart(24)).join('')}`,
  ];
  for (const p of sweep.points) {
    lines.push(`  ${`×${fmt(p.factor)}`.padStart(8)}  ${p.values.map((v) => `${fmt(v.actualWorst)} / ${fmt(v.believedWorst)}`.padStart(24)).join('')}`);
  }
  lines.push(`  smallest actual worst at: ${Object.entries(sweep.bestFactor).map(([id, f]) => `${id} ×${fmt(f)}`).join(', ')}`);
  return [...lines, '', `CAUTION: ${CAUTION}`, ''].join('\n');
}
