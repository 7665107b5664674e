import type { RunSink, StudyShape } from './monte-carlo-model';

/**
 * Running sums of a set of runs, per step: for each quantity Σe, Σe² and the
 * Σ of the filter's variance; for each NEES group Σ NEES and Σ dof. Memory is
 * steps × fields, whatever the number of runs.
 */
export interface StudySums {
  runs: number;
  /** Row-major steps × fields. */
  data: Float64Array;
}

/** Where each sum lives in a step's row of {@link StudySums.data}. */
export interface SumLayout {
  steps: number;
  quantities: number;
  groups: number;
  /** Doubles per step: 3 per quantity, 2 per NEES group. */
  fields: number;
}

/** The layout of a model's sums. */
export function sumLayout(model: StudyShape): SumLayout {
  const quantities = model.quantities.length, groups = model.neesGroups.length;
  return { steps: model.stepTimesS.length, quantities, groups, fields: 3 * quantities + 2 * groups };
}

/** Offsets within a step's row: quantity q at 3q (Σe, Σe², Σvar), NEES group g at 3Q + 2g (Σ NEES, Σ dof). */
export const quantityField = (q: number) => 3 * q;
export const groupField = (layout: SumLayout, g: number) => 3 * layout.quantities + 2 * g;

/** Empty sums for a layout. */
export function emptySums(layout: SumLayout): StudySums {
  return { runs: 0, data: new Float64Array(layout.steps * layout.fields) };
}

/** A sink that adds one run's values into `sums`, step by step (call `sums.runs++` after the run). */
export function summingSink(layout: SumLayout, sums: StudySums): RunSink {
  const { fields, quantities, groups } = layout;
  return {
    step(k, errors, variances, nees, neesDof) {
      const d = sums.data, o = k * fields;
      for (let q = 0; q < quantities; q++) {
        const e = errors[q];
        d[o + 3 * q] += e;
        d[o + 3 * q + 1] += e * e;
        d[o + 3 * q + 2] += variances[q];
      }
      const g0 = o + 3 * quantities;
      for (let g = 0; g < groups; g++) {
        d[g0 + 2 * g] += nees[g];
        d[g0 + 2 * g + 1] += neesDof[g];
      }
    },
  };
}

/** left += right, element by element (the only way two sets of sums are combined). */
export function addSums(left: StudySums, right: StudySums): StudySums {
  const out = { runs: left.runs + right.runs, data: left.data.slice() };
  for (let i = 0; i < out.data.length; i++) out.data[i] += right.data[i];
  return out;
}
