import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors';
import { computeBudget } from '../../src/pipeline';
import { documentPathOf, evaluateBudgetDocument, type InputIndexMap } from '../../src/sheet';
import { minimalDocument } from '../document/minimal-document';

const map: InputIndexMap = {
  sensors: [0, 2], sources: [[1, 2], [0, 3]], outages: [[], [1]], landmarks: [[], [4]],
  segments: [0, 2], requirements: [1], checkpoints: [0, 2],
};

describe('documentPathOf', () => {
  it.each([
    ['sensors[1].sources[1].value.value', 'sensors[2].sources[3].value'],
    ['sensors[1].sources[1].value.unit', 'sensors[2].sources[3].unit'],
    ['sensors[0].sources[0].correlationTime.value', 'sensors[0].sources[1].correlationTime.value'],
    ['sensors[1].outages[0].end', 'sensors[2].outages[1].end'],
    ['sensors[1].landmarks[0].north.unit', 'sensors[2].landmarks[4].north.unit'],
    ['sensors[1].rate.value', 'sensors[2].rate.value'],
    ['step.value', 'settings.step.value'],
    ['step', 'settings.step'],
    ['mission.initialSigma.position.value', 'mission.initialPosition.value'],
    ['mission.initialSigma.heading.unit', 'mission.initialHeading.unit'],
    ['mission.segments[1].speed.value', 'mission.segments[2].speed.value'],
    ['requirements[0].window', 'requirements[1].window'],
    ['checkpoints[1].time.value', 'checkpoints[2].time.value'],
    ['sensors', 'sensors'],
    ['', ''],
  ])('maps %s to %s', (inputPath, documentPath) => {
    expect(documentPathOf(inputPath, map)).toBe(documentPath);
  });

  it('points an engine error at the document cell even when an earlier row was left out', () => {
    const doc = minimalDocument();
    doc.sensors[0].sources[0].value = '=1/0';
    doc.sensors[0].sources[1].value = -5;
    const ev = evaluateBudgetDocument(doc);
    let caught: unknown;
    try {
      computeBudget(ev.input!);
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(InputError);
    expect(documentPathOf((caught as InputError).path, ev.indexMap)).toBe('sensors[0].sources[1].value');
  });
});
