/**
 * A budget whose gyro has three candidates of published grades (rows from the
 * grade presets, src/presets/grade-presets.ts, without the bias-instability
 * row so the heading error has a closed form), on an invented scenario: the
 * vehicle stands still for 60 s with no initial uncertainty, GNSS out over
 * the whole mission, so heading σ² = N²t + (b t)² (docs/checks.md §4.1 and
 * §4.2, added in variance: the white noise and the random constant are
 * independent).
 */
import type { BudgetDocument, SourceRow } from '../../src/document';
import '../../src/compare';
import { presetRows } from '../../src/presets/grade-presets';

const q = (value: number, unit: string) => ({ value, unit });

/** ARW and turn-on bias of a preset (its bias-instability row left out). */
export const closedFormRows = (preset: string): SourceRow[] =>
  presetRows(preset).filter((r) => r.kind !== 'bias-instability');

/** Invented prices per unit (demo numbers, not any real part's). */
export const PRICES = { consumerMems: 20, tactical: 4000, navigation: 90000 } as const;

export function gradeCandidates(
  limitsDeg: { coarse: number; fine?: number } = { coarse: 0.5, fine: 0.1 },
): BudgetDocument {
  return {
    format: 'sigma-ledger-budget',
    formatVersion: 2,
    title: 'Gyro grades standing still (invented test scenario)',
    settings: { step: q(0.1, 's') },
    mission: {
      start: { north: q(0, 'm'), east: q(0, 'm'), heading: q(0, 'deg') },
      initialPosition: { ...q(0, 'm'), provenance: 'test: known start', assumed: false },
      initialHeading: { ...q(0, 'deg'), provenance: 'test: known start', assumed: false },
      segments: [{ duration: q(60, 's'), speed: q(0, 'm/s'), turnRate: q(0, 'deg/s') }],
    },
    sensors: [
      { id: 'gyro', kind: 'yaw-gyro', rate: q(100, 'Hz'), sources: closedFormRows('tactical') },
      { id: 'wheel', kind: 'wheel-speed', rate: q(10, 'Hz'), sources: [] },
      {
        id: 'gnss',
        kind: 'gnss-position',
        rate: q(1, 'Hz'),
        outages: [{ id: 'blocked', start: q(0, 's'), end: q(60, 's') }],
        sources: [
          { id: 'noise', kind: 'white-noise', value: 1.5, unit: 'm', provenance: 'test value', assumed: false },
        ],
      },
    ],
    requirements: [
      { id: 'coarse', quantity: 'heading', level: '1sigma', limit: q(limitsDeg.coarse, 'deg') },
      ...(limitsDeg.fine === undefined
        ? []
        : [{ id: 'fine', quantity: 'heading' as const, level: '1sigma' as const, limit: q(limitsDeg.fine, 'deg') }]),
    ],
    candidates: [
      {
        sensor: 'gyro',
        currency: 'EUR',
        note: 'three grades for the heading gyro',
        options: (['consumerMems', 'tactical', 'navigation'] as const).map((id) => ({
          id,
          price: PRICES[id],
          sources: closedFormRows(id),
        })),
      },
    ],
  };
}
