import { beforeAll, describe, expect, it } from 'vitest';
import { runInertialBudget, type InertialBudget } from '../../src/inertial/run-inertial';
import { droneScenario, roverScenario } from '../fixtures/inertial-scenarios';

// Expected 1σ values, shares and calibration sigmas: docs/reference-scenarios.md (an independent
// implementation of docs/inertial-model.md, step-start F at 0.1 s). Agreement within 0.5 % is required.
const TOLERANCE = 0.005;
const DEG = Math.PI / 180;
const DEG_PER_H = DEG / 3600;
const UG = 9.80665e-6;
const PPM = 1e-6;

type Row = number[];
const VALUE_COLUMNS = ['north', 'east', 'down', 'drms', 'velocityNorth', 'velocityEast', 'velocityDown', 'roll', 'pitch', 'yaw'];
const VALUE_SCALE = [1, 1, 1, 1, 1, 1, 1, DEG, DEG, DEG];

function expectClose(actual: number, expected: number, what: string): void {
  expect(Math.abs(actual - expected) / Math.abs(expected), `${what}: ${actual} vs ${expected}`).toBeLessThanOrEqual(TOLERANCE);
}

const stepAt = (tS: number) => Math.round(tS / 0.1);

function checkValues(b: () => InertialBudget, values: Row[], derived: Row[]): void {
  it.each(values)('matches N, E, D, DRMS, velocity and attitude at t = %d s', (t, ...expected) => {
    const k = stepAt(t);
    VALUE_COLUMNS.forEach((id, c) => expectClose(b().series[id].sigma[k], expected[c] * VALUE_SCALE[c], `${id} at ${t} s`));
  });
  it.each(derived)('matches CEP, R95, SEP, along and cross at t = %d s', (t, cep, r95, sep, along, cross) => {
    const k = stepAt(t);
    expectClose(b().cepM[k], cep, 'CEP');
    expectClose(b().r95M[k], r95, 'R95');
    expectClose(b().sepAtM(k), sep, 'SEP');
    expectClose(b().series.along.sigma[k], along, 'along');
    expectClose(b().series.cross.sigma[k], cross, 'cross');
  });
}

function checkShares(b: () => InertialBudget, tS: number, quantity: string, expected: [string, number][]): void {
  it(`has the three largest shares of ${quantity} variance at ${tS} s`, () => {
    const k = stepAt(tS);
    const total = b().series[quantity].sigma[k] ** 2;
    const shares = b().model.sources.map((s, i) => ({ id: s.id, percent: (100 * b().series[quantity].varianceBySource[i][k]) / total }))
      .sort((x, y) => y.percent - x.percent);
    expected.forEach(([id, percent], i) => {
      expect(shares[i].id).toBe(id);
      expectClose(shares[i].percent, percent, `${id} share`);
    });
  });
}

function checkCalibration(b: () => InertialBudget, names: [string, number][], rows: Row[]): void {
  it.each(rows)('matches every calibration sigma at t = %d s', (t, ...expected) => {
    const k = stepAt(t);
    names.forEach(([name, unit], c) => expectClose(b().calibrationSigma[name][k], expected[c] * unit, `${name} at ${t} s`));
  });
}

const gyroAccelNames = (extra: [string, number][]): [string, number][] => [
  ...['x', 'y', 'z'].map((a): [string, number] => [`imu.gBias.${a}`, DEG_PER_H]),
  ...['x', 'y'].map((a): [string, number] => [`imu.gBi.${a}`, DEG_PER_H]),
  ...extra,
];

describe('reference scenario ins-reference-drone (docs/reference-scenarios.md)', () => {
  let budget: InertialBudget;
  beforeAll(() => { budget = runInertialBudget(droneScenario()); }, 600_000);
  const b = () => budget;
  checkValues(b, [
    [300.0, 0.18500, 0.18497, 0.10064, 0.26160, 0.019728, 0.019561, 0.005176, 0.017840, 0.017950, 0.124818],
    [330.0, 2.28334, 2.29633, 0.10324, 3.23833, 0.156818, 0.158346, 0.005440, 0.045659, 0.045199, 0.131907],
    [344.9, 5.42860, 5.47676, 0.10304, 7.71133, 0.281456, 0.284615, 0.005431, 0.061153, 0.060511, 0.136335],
    [405.0, 0.18318, 0.18317, 0.09498, 0.25905, 0.019355, 0.019473, 0.005232, 0.014117, 0.015406, 0.125000],
    [600.0, 0.18307, 0.18307, 0.08339, 0.25890, 0.018834, 0.018834, 0.005144, 0.015790, 0.015860, 0.124668],
  ], [
    [300.0, 0.21780, 0.45279, 0.24217, 0.18500, 0.18497],
    [330.0, 2.69607, 5.60499, 2.69805, 2.28334, 2.29633],
    [344.9, 6.42002, 13.34704, 6.42306, 5.42860, 5.47676],
    [405.0, 0.21568, 0.44838, 0.23768, 0.18317, 0.18318],
    [600.0, 0.21555, 0.44811, 0.23257, 0.18307, 0.18307],
  ]);
  checkShares(b, 344.9, 'drms', [['imu.gBi', 51.89], ['gnssVel.white', 29.42], ['imu.gArw', 15.83]]);
  checkShares(b, 344.9, 'yaw', [['gnssVel.white', 32.65], ['heading.white', 31.19], ['imu.gBiz', 17.95]]);
  checkCalibration(b, gyroAccelNames([
    ['imu.gBiz.z', DEG_PER_H], ...['x', 'y', 'z'].map((a): [string, number] => [`imu.gSf.${a}`, PPM]),
    ...['x', 'y', 'z'].map((a): [string, number] => [`imu.aBias.${a}`, UG]), ...['x', 'y', 'z'].map((a): [string, number] => [`imu.aBi.${a}`, UG]),
    ['baro.bias', 1], ['heading.bias', DEG],
  ]), [
    [0.0, 50, 50, 50, 4.8594, 4.8594, 8.0989, 2000, 2000, 2000, 3000, 3000, 3000, 64.792, 64.792, 64.792, 2.031, 0.98319],
    [300.0, 3.3175, 3.3094, 7.2307, 4.1052, 4.0847, 7.6078, 2000, 2000, 1189.5, 175.16, 170.84, 54.929, 64.662, 64.665, 56.899, 0.08388, 0.10215],
    [344.9, 3.317, 3.3086, 7.025, 4.5665, 4.5589, 7.4799, 2000, 2000, 1177.3, 175.15, 169.74, 53.519, 64.696, 64.696, 55.847, 0.083873, 0.10105],
    [600.0, 2.5365, 2.5356, 5.6997, 3.6594, 3.6591, 7.0514, 2000, 2000, 988.41, 138.66, 136.05, 47.095, 64.661, 64.679, 50.837, 0.061667, 0.078758],
  ]);
});

describe('reference scenario ins-reference-rover (docs/reference-scenarios.md)', () => {
  let budget: InertialBudget;
  beforeAll(() => { budget = runInertialBudget(roverScenario()); }, 600_000);
  const b = () => budget;
  checkValues(b, [
    [430.0, 0.66973, 0.55760, 0.76938, 0.87146, 0.008863, 0.011410, 0.007949, 0.005344, 0.005179, 0.209463],
    [460.0, 0.73164, 0.60452, 0.78865, 0.94907, 0.008537, 0.011271, 0.007972, 0.006471, 0.005958, 0.226227],
    [549.9, 0.98214, 0.95136, 0.84392, 1.36737, 0.008696, 0.011874, 0.007968, 0.006819, 0.006374, 0.281315],
    [610.0, 0.63388, 0.64747, 0.74648, 0.90611, 0.011124, 0.007637, 0.007938, 0.006751, 0.006386, 0.198803],
    [900.0, 0.65946, 0.53428, 0.68496, 0.84873, 0.010510, 0.007991, 0.007919, 0.007168, 0.006699, 0.172620],
  ], [
    [430.0, 0.72107, 1.51556, 1.02314, 0.66052, 0.56847],
    [460.0, 0.78485, 1.65124, 1.08889, 0.68179, 0.66023],
    [549.9, 1.10525, 2.42228, 1.39997, 0.78516, 1.11947],
    [610.0, 0.74866, 1.57758, 1.03587, 0.64747, 0.63388],
    [900.0, 0.69546, 1.48737, 0.95929, 0.50218, 0.68422],
  ]);
  checkShares(b, 549.9, 'drms', [['gnss.multipath', 55.06], ['imu.gBias', 18.26], ['nhc.sigma', 11.37]]);
  checkShares(b, 549.9, 'yaw', [['imu.gBias', 53.30], ['gnss.multipath', 31.57], ['nhc.sigma', 6.45]]);
  checkCalibration(b, gyroAccelNames([
    ['imu.gBi.z', DEG_PER_H], ...['x', 'y', 'z'].map((a): [string, number] => [`imu.gSf.${a}`, PPM]),
    ...['x', 'y', 'z'].map((a): [string, number] => [`imu.aBias.${a}`, UG]), ...['x', 'y', 'z'].map((a): [string, number] => [`imu.aBi.${a}`, UG]),
    ...['x', 'y', 'z'].map((a): [string, number] => [`imu.aSf.${a}`, PPM]),
    ...['north', 'east', 'down'].map((a): [string, number] => [`gnss.multipath.${a}`, 1]), ['odometer.sf', PPM],
  ]), [
    [0.0, 3, 3, 3, 0.80989, 0.80989, 0.80989, 300, 300, 300, 300, 300, 300, 80.989, 80.989, 80.989, 300, 300, 300, 0.75324, 0.75324, 1.3849, 5000],
    [430.0, 0.65737, 0.65637, 2.5874, 0.72268, 0.7202, 0.80799, 300, 300, 298.73, 87.128, 83.283, 214.45, 76.557, 75.952, 66.787, 298.87, 299.67, 214.45, 0.68623, 0.61058, 0.97783, 1648.7],
    [549.9, 0.61668, 0.6144, 2.5828, 0.69015, 0.68404, 0.80902, 300, 300, 298.63, 83.989, 80.79, 214.21, 78.634, 78.374, 64.167, 298.87, 299.61, 214.21, 0.79805, 0.79691, 1.492, 1635.3],
    [900.0, 0.53455, 0.53306, 1.3398, 0.64645, 0.63865, 0.807, 300, 300, 296.39, 73.982, 71.487, 213.71, 79.684, 79.543, 58.592, 297.56, 299.39, 213.71, 0.66889, 0.58335, 0.90347, 955.09],
  ]);
});
