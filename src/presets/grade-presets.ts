/**
 * Starting rows for a sensor from published grade tables (docs/checks.md
 * §8.1): "consumer MEMS", "industrial MEMS", "tactical" and "navigation".
 * Every row is marked assumed (nobody measured this part) and its
 * provenance names where the number comes from; where no source gives a
 * value per grade, the row says "common practice, no source". A user starts
 * from a preset and edits the rows to the datasheet.
 */
import type { SourceRow } from '../document/budget-document';
import type { SourceKind } from '../inputs/budget-input';
import type { DimensionName } from '../units';

/** One row of a preset, before it is written into a sensor. */
interface PresetRow {
  id: string;
  kind: SourceKind;
  value: number;
  unit: string;
  dimension: DimensionName;
  correlationTime?: { value: number; unit: string };
  provenance: string;
}

/** A grade preset: a name the trade uses and its rows. */
export interface GradePreset {
  id: string;
  label: string;
  rows: readonly PresetRow[];
}

const TABLE_1 = 'N. El-Sheimy and A. Youssef, Satellite Navigation 1:2 (2020), Table 1 (docs/checks.md §8.1)';
const FIXTURE = 'typical value for the grade, common practice, no source (docs/checks.md §8.1)';
const ARW_RANGE = (range: string) => `${FIXTURE}; within the grade's usual ARW ${range} °/√h (from memory)`;
const BI_TIME = { value: 100, unit: 's' };
const BI_TIME_NOTE = '; correlation time 100 s, the usual assumption when unknown (docs/planar-model.md §3)';

function gyroRows(arw: number, arwRange: string, floor: number, drift: number, driftSource: string): PresetRow[] {
  return [
    {
      id: 'arw',
      kind: 'white-noise',
      value: arw,
      unit: 'deg/√h',
      dimension: 'angle-random-walk',
      provenance: ARW_RANGE(arwRange),
    },
    {
      id: 'bi',
      kind: 'bias-instability',
      value: floor,
      unit: 'deg/h',
      dimension: 'angular-rate',
      correlationTime: BI_TIME,
      provenance: FIXTURE + BI_TIME_NOTE,
    },
    {
      id: 'bias',
      kind: 'turn-on-bias',
      value: drift,
      unit: 'deg/h',
      dimension: 'angular-rate',
      provenance: driftSource,
    },
  ];
}

/** The grade presets, from the noisiest to the best. */
export const GRADE_PRESETS: readonly GradePreset[] = [
  {
    id: 'consumerMems',
    label: 'consumer MEMS',
    rows: gyroRows(0.3, '0.2-1', 10, 360, `gyro drift 0.1 °/s (360 °/h) of the commercial grade, ${TABLE_1}`),
  },
  {
    id: 'industrialMems',
    label: 'industrial MEMS',
    rows: gyroRows(
      0.15,
      '0.1-0.3',
      2,
      36,
      `0.01 °/s (36 °/h), between the commercial and tactical grades' drift: ${FIXTURE}`,
    ),
  },
  {
    id: 'tactical',
    label: 'tactical',
    rows: gyroRows(0.05, '0.02-0.5', 0.5, 10, `gyro drift 1-10 °/h of the tactical grade (the upper end), ${TABLE_1}`),
  },
  {
    id: 'navigation',
    label: 'navigation',
    rows: gyroRows(
      0.002,
      '0.002-0.005',
      0.005,
      0.01,
      `gyro drift < 0.01 °/h of the navigation grade (the bound), ${TABLE_1}`,
    ),
  },
];

/** Which row kinds a sensor kind accepts, with the dimensions of their magnitudes (a sensor kind's `rows`). */
export type AcceptedRows = Partial<Record<SourceKind, readonly DimensionName[]>>;

/** The presets whose every row a sensor kind accepts (for the page's "start from" list): a gyro's, not a compass's. */
export function presetsFor(accepted: AcceptedRows): GradePreset[] {
  return GRADE_PRESETS.filter((p) => p.rows.every((r) => accepted[r.kind]?.includes(r.dimension)));
}

/**
 * The document rows of preset `presetId`, each marked assumed with its
 * provenance ("grade preset tactical: ..."), ready to be a sensor's `sources`.
 * @throws Error for an unknown preset id (the page offers only known ones).
 */
export function presetRows(presetId: string): SourceRow[] {
  const preset = GRADE_PRESETS.find((p) => p.id === presetId);
  if (!preset) throw new Error(`no grade preset "${presetId}"; one of ${GRADE_PRESETS.map((p) => p.id).join(', ')}`);
  return preset.rows.map((r) => ({
    id: r.id,
    kind: r.kind,
    value: r.value,
    unit: r.unit,
    ...(r.correlationTime && { correlationTime: { ...r.correlationTime } }),
    provenance: `grade preset "${preset.label}": ${r.provenance}`,
    assumed: true,
  }));
}
