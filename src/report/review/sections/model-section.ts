import type { ReportSection } from '../review-report';
import { fmt, type ReviewContext } from '../review-context';
import { SENSOR_KINDS } from '../../../sensors/registry';

/** What the linearised model rests on, stated once for every report (docs/planar-model.md). */
const MODEL_ASSUMPTIONS = [
  'Planar motion: position north and east, heading from north towards east; no pitch, roll or height (docs/planar-model.md §1, §2).',
  'Errors are small and the model is linearised about the nominal path; error = estimate − truth, SI units inside (docs/planar-model.md §1, §3, §5).',
  'Position error states are in the path frame (along-track, cross-track); north and east follow by rotation with the nominal heading (docs/planar-model.md §4).',
  'Process noise is discretised by Van Loan\'s method once per constant-speed leg (docs/planar-model.md §4); measurements update sequentially in Joseph form with gains of the full model (§6).',
  'Each source\'s share comes from running the same gains with only that source\'s P0, Q and R (fixed-gain method), so the shares add up to the total (docs/planar-model.md §7).',
  'Bias instability is a first-order Gauss-Markov bias whose Allan deviation peaks at the datasheet floor; noise densities are two-sided IEEE Std 952 coefficients unless a row says otherwise.',
  'Outages are half-open windows [start, end): a measurement at the end time is used.',
  'The filter is taken to be optimal for this model: the real filter, the real vehicle and the real sky will differ.',
];

/** The model: states, measurement models, step and the assumptions it rests on. */
export function modelSection(ctx: ReviewContext): ReportSection {
  const { model, trajectory } = ctx.result;
  const perSource = model.sources.flatMap((s) => s.assumptions.map((a) => `${s.id}: ${a}`));
  return {
    id: 'model',
    title: 'Model',
    blocks: [
      { kind: 'paragraph', text: `Linearised covariance analysis with ${model.states.length} error states, a step of ${fmt(trajectory.stepS)} s over ${fmt(ctx.result.mission.durationS)} s (${trajectory.tS.length} steps), ${model.sources.length} error sources.` },
      {
        kind: 'table', id: 'states', caption: 'Error states', columns: ['State', 'SI unit', 'Calibration state'],
        rows: model.states.map((s) => [s.name, s.unitSI, s.calibration ? 'yes' : 'no']),
      },
      {
        kind: 'table', id: 'measurement-models', caption: 'Sensors in the model', columns: ['Sensor', 'Role', 'Rate (Hz)', 'Model'],
        rows: ctx.input.sensors.map((s) => {
          const spec = SENSOR_KINDS[s.kind];
          const stream = model.streams.find((m) => m.sensorId === s.id);
          return [s.id, spec.role, stream ? fmt(stream.rateHz) : `${s.rate.value} ${s.rate.unit}`, `${spec.label}: ${spec.model}`];
        }),
      },
      { kind: 'list', items: [...MODEL_ASSUMPTIONS, ...perSource] },
    ],
  };
}
