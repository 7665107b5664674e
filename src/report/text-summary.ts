import type { BudgetResult } from '../pipeline';
import type { RequirementResult } from '../budget/requirements';
import type { CheckpointBudget } from '../budget/checkpoints';
import { formatSignificant, withUnit } from '../units';
import { confidenceFactor1D } from '../budget/confidence';
import type { ConfidenceLevel } from '../inputs/budget-input';
import { CAUTION } from './caution';
import { DISPLAY, sigmaForDisplay } from './display-units';
import { traceNoise, type NoiseTrace, type TracedEntry } from './noise-trace';

/** What the summary needs besides the result. */
export interface SummaryContext {
  title: string;
  fileName: string;
}

const fmt = (x: number) => formatSignificant(x, 4);
const time = (s: number) => `${formatSignificant(s, 6)} s`;

/**
 * The readable summary `sigma-ledger run` prints: requirements with verdict,
 * margin and time-to-exceed per outage; the budget at each checkpoint with
 * sources sorted by share; the R, Q and P0 used, traced to rows; the
 * calibration states' final sigma; numerical status; the caution.
 */
export function formatSummary(result: BudgetResult, ctx: SummaryContext): string {
  return [
    `Sigma Ledger budget: ${ctx.title}`,
    `file: ${ctx.fileName}; mission ${time(result.mission.durationS)}, step ${time(result.trajectory.stepS)}, ` +
      `${result.model.states.length} states, ${result.model.sources.length} sources`,
    `CAUTION: ${CAUTION}`,
    '',
    ...requirementLines(result.requirements),
    '',
    ...assumptionLines(result.model.sources),
    ...result.checkpoints.flatMap((cp) => checkpointLines(cp, result.reportLevel)),
    ...calibrationLines(result),
    '',
    ...traceLines(traceNoise(result.model)),
    '',
    ...statusLines(result),
  ].join('\n') + '\n';
}

/** The requirement verdicts of either model, with time-to-exceed per outage. Throws nothing. */
export function requirementLines(reqs: RequirementResult<string>[]): string[] {
  if (reqs.length === 0) return ['REQUIREMENTS: none given'];
  const held = reqs.filter((r) => r.verdict === 'pass').length;
  const lines = [`REQUIREMENTS: ${held} of ${reqs.length} hold`];
  for (const r of reqs) {
    const unit = r.limit.unit;
    lines.push(
      `  [${r.verdict.toUpperCase()}] ${r.id}: ${r.quantity} (${r.level}) <= ${r.limit.value} ${unit} over ${time(r.windowStartS)} to ${time(r.windowEndS)}; ` +
        `worst ${fmt(r.worstValue)} ${unit} at ${time(r.worstTimeS)}, margin ${fmt(r.margin)} ${unit}`,
    );
    for (const o of r.outages) {
      const held = o.timeToExceedS === null ? 'holds throughout' : `breaks ${fmt(o.timeToExceedS)} s after it begins`;
      lines.push(`      ${o.sensorId} outage "${o.outageId}" (${time(o.startS)} to ${time(o.endS)}): ${held}`);
    }
  }
  return lines;
}

/** The sources marked assumed, of either model. Throws nothing. */
export function assumptionLines(sources: readonly { id: string; assumed: boolean; provenance?: string }[]): string[] {
  const assumed = sources.filter((s) => s.assumed);
  if (assumed.length === 0) return [];
  return [
    `ASSUMED VALUES (nobody measured these or read them from a datasheet; the verdicts rest on them):`,
    ...assumed.map((s) => `  ${s.id}${s.provenance ? `: ${s.provenance}` : ''}`),
    '',
  ];
}

function checkpointLines(cp: CheckpointBudget, level: ConfidenceLevel): string[] {
  const heading = level === '1sigma'
    ? `BUDGET at ${cp.id} (t = ${time(cp.tS)}), 1σ, sources by share of variance:`
    : `BUDGET at ${cp.id} (t = ${time(cp.tS)}), at ${level} (${fmt(confidenceFactor1D(level))} σ; DRMS at 1σ), sources by share of variance:`;
  const lines = [heading];
  for (const qb of cp.quantities) {
    const unit = DISPLAY[qb.quantity].unit;
    const f = qb.quantity === 'drms' ? 1 : confidenceFactor1D(level);
    lines.push(`  ${DISPLAY[qb.quantity].label}: ${fmt(f * sigmaForDisplay(qb.quantity, qb.totalSigmaSI))} ${unit}`);
    for (const s of qb.shares) {
      if (s.fraction < 0.0005) continue;
      lines.push(`      ${(100 * s.fraction).toFixed(1).padStart(5)} %  ${fmt(f * sigmaForDisplay(qb.quantity, s.sigmaSI)).padStart(9)} ${unit}  ${s.sourceId}`);
    }
  }
  lines.push('');
  return lines;
}

function calibrationLines(result: BudgetResult): string[] {
  const h = result.history;
  if (h.calibrationStates.length === 0) return [];
  const last = h.steps - 1;
  const lines = ['CALIBRATION STATES (1σ at the start -> at the end, SI):'];
  h.calibrationStates.forEach((i, c) => {
    const st = result.model.states[i];
    lines.push(`  ${st.name}: ${fmt(h.calibrationSigma[c][0])} -> ${fmt(h.calibrationSigma[c][last])} ${st.unitSI}`);
  });
  return lines;
}

/** The R, Q and P0 used, traced to rows, of either model. Throws nothing. */
export function traceLines(trace: NoiseTrace, discretisation = 'Q_d by Van Loan per step'): string[] {
  const block = (title: string, entries: TracedEntry[]) => [
    title,
    ...entries.flatMap((e) => [
      `  ${e.name}: ${withUnit(fmt(e.totalSI), e.unitSI)}`,
      ...e.pieces.flatMap((p) => [`      ${fmt(p.valueSI)} from ${p.sourceId}: ${p.derivation}`, ...p.conversions.map((c) => `          ${c}`)]),
    ]),
  ];
  return [
    ...block('R USED (measurement noise variance per scalar measurement):', trace.r),
    ...block(`Q USED (continuous PSD per noise input; ${discretisation}):`, trace.q),
    ...block('P0 USED (initial variance per state):', trace.p0),
  ];
}

function statusLines(result: BudgetResult): string[] {
  return numericalStatusLines(result.history.issues, result.warnings);
}

/** The numerical status of a run of either model, with any model warnings. Throws nothing. */
export function numericalStatusLines(issues: BudgetResult['history']['issues'], modelWarnings: BudgetResult['warnings']): string[] {
  const warnings = modelWarnings.map((w) => `  WARNING ${w.source}: ${w.message}`);
  if (issues.length === 0) return ['NUMERICAL STATUS: covariance stayed finite, symmetric and positive semi-definite', ...warnings];
  return ['NUMERICAL STATUS: problems found', ...issues.map((i) => `  ${i.kind} at ${time(i.tS)}: ${i.detail}`), ...warnings];
}
