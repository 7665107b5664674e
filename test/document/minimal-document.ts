/** A small valid budget document for tests (an invented scenario), built fresh on every call so tests may change it. */
import type { BudgetDocument } from '../../src/document';

export function minimalDocument(): BudgetDocument {
  return {
    format: 'sigma-ledger-budget',
    formatVersion: 2,
    title: 'Minimal test budget',
    description: 'An invented scenario for tests: a gyro and a wheel-speed sensor on a straight drive.',
    settings: { step: { value: 1, unit: 's' } },
    values: {
      cruiseSpeed: { value: 2, unit: 'm/s', note: 'invented' },
    },
    mission: {
      start: { north: { value: 0, unit: 'm' }, east: { value: 0, unit: 'm' }, heading: { value: 0, unit: 'deg' } },
      initialPosition: { value: 1, unit: 'm', provenance: 'guess', assumed: true },
      initialHeading: { value: 1, unit: 'deg', provenance: 'guess', assumed: true },
      segments: [{ id: 'straight', duration: { value: 60, unit: 's' }, speed: { value: '=cruiseSpeed', unit: 'm/s' }, turnRate: { value: 0, unit: 'deg/s' } }],
    },
    sensors: [
      {
        id: 'gyro',
        kind: 'yaw-gyro',
        rate: { value: 100, unit: 'Hz' },
        sources: [
          { id: 'arw', kind: 'white-noise', value: 0.2, unit: 'deg/√h', provenance: 'invented datasheet', assumed: false },
          { id: 'bi', kind: 'bias-instability', value: 5, unit: 'deg/h', correlationTime: { value: 150, unit: 's' }, provenance: 'invented datasheet', assumed: false },
        ],
      },
      {
        id: 'odo',
        kind: 'wheel-speed',
        rate: { value: 10, unit: 'Hz' },
        sources: [{ id: 'sf', kind: 'scale-factor', value: 1, unit: '%', provenance: 'guess', assumed: true }],
      },
    ],
    requirements: [{ id: 'heading', quantity: 'heading', level: '1sigma', limit: { value: 5, unit: 'deg' } }],
    checkpoints: [{ id: 'end', time: { value: 60, unit: 's' } }],
  };
}
