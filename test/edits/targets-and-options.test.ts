/**
 * Under Node, the two edit modules the page's grid and log import read
 * (src/edits/log-targets.ts, src/edits/row-options.ts): which sensors a log's
 * result may be written into, which rows they take in which unit, and which
 * model option applies to a row. The expected values are the kinds'
 * declarations (src/sensors/*.ts, src/sources/*.ts), named beside each check.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseBudgetDocument } from '../../src/document';
import { ALLAN_TARGET_KIND, CALIBRATION_TARGET_KIND, rowRefusal, sensorsOfKind } from '../../src/edits/log-targets';
import { OPTION_FIELDS, optionFieldsOf, rowOptionFor } from '../../src/edits/row-options';

const orchard = () => parseBudgetDocument(readFileSync('budgets/orchard-rover.json', 'utf8'), 'orchard-rover.json').document;
const none = () => undefined;

describe('log targets', () => {
  it("send a gyro log's terms to the yaw-rate gyro, a speed log's to the wheel-speed sensor, an accelerometer's nowhere", () => {
    // yaw-gyro.ts logs.allan 'gyro', wheel-speed.ts logs.allan 'speed'; no planar kind takes accelerometer terms.
    expect(ALLAN_TARGET_KIND).toEqual({ gyro: 'yaw-gyro', accelerometer: undefined, speed: 'wheel-speed' });
  });

  it('send a calibration by its unit: rates to the gyro, speeds to the wheel-speed sensor, angles to the compass', () => {
    expect(CALIBRATION_TARGET_KIND['angular-rate']).toBe('yaw-gyro');
    expect(CALIBRATION_TARGET_KIND.speed).toBe('wheel-speed');
    expect(CALIBRATION_TARGET_KIND.angle).toBe('compass');
    expect(CALIBRATION_TARGET_KIND.length).toBeUndefined();
  });

  it("list the document's sensors of a kind with their index, and none for no kind", () => {
    const doc = orchard();
    const gyroIndex = doc.sensors.findIndex((s) => s.kind === 'yaw-gyro');
    expect(sensorsOfKind(doc, 'yaw-gyro')).toEqual([{ index: gyroIndex, id: doc.sensors[gyroIndex].id, kind: 'yaw-gyro' }]);
    expect(sensorsOfKind(doc, 'compass')).toEqual([]);
    expect(sensorsOfKind(doc, undefined)).toEqual([]);
  });

  it('refuse a row the sensor kind does not take, and a unit of the wrong dimension, saying which', () => {
    // compass.ts rows: white-noise and turn-on-bias, both in angle.
    expect(rowRefusal('compass', 'white-noise', 'deg')).toBeUndefined();
    expect(rowRefusal('compass', 'scale-factor', 'ppm')).toBe('a compass heading has no scale-factor row');
    expect(rowRefusal('compass', 'white-noise', 'm')).toBe("a compass heading's white-noise row does not take m");
    expect(rowRefusal('compass', 'white-noise', 'not a unit')).toBe("a compass heading's white-noise row does not take not a unit");
  });
});

describe('row options', () => {
  it("give a gyro's quantisation row the quantum option, rate LSB unless its unit is an angle (yaw-gyro.ts)", () => {
    expect(rowOptionFor('yaw-gyro', 'quantisation', 'angular-rate', none)).toMatchObject({ field: 'quantum', fallback: 'rate' });
    expect(rowOptionFor('yaw-gyro', 'quantisation', 'angle', none)?.fallback).toBe('angle');
  });

  it("give a range-bearing row the component option by its unit: bearing for an angle, range for a length (range-bearing.ts)", () => {
    expect(rowOptionFor('range-bearing', 'white-noise', 'angle', none)).toMatchObject({ field: 'component', fallback: 'bearing' });
    expect(rowOptionFor('range-bearing', 'turn-on-bias', 'length', none)?.fallback).toBe('range');
  });

  it('offer density sides only for a density, or where the row already chose them (white-noise.ts appliesTo)', () => {
    expect(rowOptionFor('yaw-gyro', 'white-noise', 'angle-random-walk', none)).toMatchObject({ field: 'densitySides', fallback: 'two' });
    expect(rowOptionFor('yaw-gyro', 'white-noise', 'angular-rate', none)).toBeUndefined();
    expect(rowOptionFor('yaw-gyro', 'white-noise', 'angular-rate', (f) => (f === 'densitySides' ? 'one' : undefined))?.field).toBe('densitySides');
  });

  it('give no option to a row kind that declares none', () => {
    expect(rowOptionFor('yaw-gyro', 'scale-factor', 'ratio', none)).toBeUndefined();
    expect(optionFieldsOf('yaw-gyro', 'scale-factor')).toEqual([]);
  });

  it("let the sensor's own option win over the source kind's, and list each option field once", () => {
    expect(optionFieldsOf('range-bearing', 'white-noise')).toEqual(['component']);
    expect(optionFieldsOf('yaw-gyro', 'white-noise')).toEqual(['densitySides']);
    expect([...OPTION_FIELDS].sort()).toEqual(['biasForm', 'component', 'densitySides', 'multipathModel', 'quantum']);
  });
});
