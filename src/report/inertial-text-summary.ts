/**
 * The readable summary `sigma-ledger run` prints for a 3-D budget: the
 * planar summary's parts (requirements with time-to-exceed per outage,
 * assumed values, R/Q/P0 traced to rows, numerical status, the caution)
 * around the 3-D budget tables and calibration states.
 */
import type { InertialBudgetResult, InertialCheckpointBudget } from '../inertial-pipeline';
import type { ConfidenceLevel } from '../inputs/budget-input';
import { formatSignificant } from '../units';
import { CAUTION } from './caution';
import { inertialDisplay, inertialLevelFactor } from './inertial-display';
import { traceInertialNoise } from './inertial-noise-trace';
import { assumptionLines, numericalStatusLines, requirementLines, traceLines, type SummaryContext } from './text-summary';

const fmt = (x: number) => formatSignificant(x, 4);
const time = (s: number) => `${formatSignificant(s, 6)} s`;

/** The summary of a 3-D result. Throws nothing. */
export function formatInertialSummary(result: InertialBudgetResult, ctx: SummaryContext): string {
  const m = result.budget.model;
  return [
    `Sigma Ledger 3-D budget: ${ctx.title}`,
    `file: ${ctx.fileName}; mission ${time(result.mission.durationS)}, step ${time(result.stepS)}, ` +
      `${m.states.length} states, ${m.sources.length} sources`,
    `CAUTION: ${CAUTION}`,
    '',
    ...requirementLines(result.requirements),
    '',
    ...assumptionLines(m.sources),
    ...result.checkpoints.flatMap((cp) => checkpointLines(cp, result.reportLevel)),
    ...calibrationLines(result),
    '',
    ...traceLines(traceInertialNoise(m), 'Q_d by the exact series per step or segment, docs/inertial-model.md §8'),
    '',
    ...numericalStatusLines(result.budget.run.issues, []),
  ].join('\n') + '\n';
}

function checkpointLines(cp: InertialCheckpointBudget, level: ConfidenceLevel): string[] {
  const at = level === '1sigma' ? '1σ' : `at ${level} (DRMS and MRSE at 1σ)`;
  const lines = [`BUDGET at ${cp.id} (t = ${time(cp.tS)}), ${at}, sources by share of variance:`];
  for (const qb of cp.quantities) {
    const d = inertialDisplay(qb.quantity);
    const f = d.factor * inertialLevelFactor(qb.quantity, level);
    lines.push(`  ${d.label} (${qb.quantity}): ${fmt(f * qb.totalSigmaSI)} ${d.unit}`);
    for (const s of qb.shares.slice(0, 5)) {
      if (s.fraction < 0.0005) continue;
      lines.push(`      ${(100 * s.fraction).toFixed(1).padStart(5)} %  ${fmt(f * s.sigmaSI).padStart(9)} ${d.unit}  ${s.sourceId}`);
    }
  }
  lines.push('');
  return lines;
}

function calibrationLines(result: InertialBudgetResult): string[] {
  const entries = Object.entries(result.budget.calibrationSigma);
  if (entries.length === 0) return [];
  const unit = new Map(result.budget.model.states.map((s) => [s.name, s.unitSI]));
  return [
    'CALIBRATION STATES (1σ at the start -> at the end, SI):',
    ...entries.map(([name, sigma]) => `  ${name}: ${fmt(sigma[0])} -> ${fmt(sigma[sigma.length - 1])} ${unit.get(name) ?? ''}`),
  ];
}
