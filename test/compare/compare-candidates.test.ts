import { describe, expect, it } from 'vitest';
import { assembleComparison, candidateRuns, compareCandidates, runCandidate } from '../../src/compare';
import { parseBudgetDocument, serializeBudgetDocument } from '../../src/document';
import { gradeCandidates, PRICES } from './grade-candidates';

// Each candidate's values, from the grade presets (src/presets/grade-presets.ts):
// turn-on bias b: consumer 360 °/h (0.1 °/s, commercial grade), tactical 10 °/h
// (upper end of 1-10 °/h), navigation 0.01 °/h (the < 0.01 °/h bound), all from
// El-Sheimy and Youssef 2020, Table 1 (docs/checks.md §8.1, published);
// ARW N: 0.3, 0.05, 0.002 °/√h (docs/checks.md §8.1, common practice, no source).
const GRADES = {
  consumerMems: { arwDegPerRootH: 0.3, biasDegPerH: 360 },
  tactical: { arwDegPerRootH: 0.05, biasDegPerH: 10 },
  navigation: { arwDegPerRootH: 0.002, biasDegPerH: 0.01 },
} as const;
type Grade = keyof typeof GRADES;

/** Heading σ in deg at t s: σ² = N² t + (b t)² (docs/checks.md §4.1, §4.2; computed). */
function headingSigmaDeg(grade: Grade, tS: number): number {
  const n = GRADES[grade].arwDegPerRootH / 60; // °/√h to °/√s
  const b = GRADES[grade].biasDegPerH / 3600; // °/h to °/s
  return Math.sqrt(n * n * tS + b * b * tS * tS);
}

/** The time at which σ reaches L: the positive root of b² t² + N² t − L² = 0 (computed). */
function timeToReachS(grade: Grade, limitDeg: number): number {
  const n2 = (GRADES[grade].arwDegPerRootH / 60) ** 2,
    b2 = (GRADES[grade].biasDegPerH / 3600) ** 2;
  return (-n2 + Math.sqrt(n2 * n2 + 4 * b2 * limitDeg * limitDeg)) / (2 * b2);
}

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('comparing gyro candidates of published grades (closed form N²t + (bt)²)', () => {
  const doc = gradeCandidates();
  const comparison = compareCandidates(doc);
  const slot = comparison.slots[0];
  const outcome = (id: Grade) => slot.outcomes.find((o) => o.candidateId === id)!;

  it('gives each candidate the verdicts the closed form predicts, with margins within 0.5 %', () => {
    expect(slot.outcomes.map((o) => o.candidateId)).toEqual(['consumerMems', 'tactical', 'navigation']);
    for (const grade of Object.keys(GRADES) as Grade[]) {
      const worst = headingSigmaDeg(grade, 60);
      for (const r of outcome(grade).requirements) {
        expect(r.verdict, `${grade} ${r.id}`).toBe(worst <= r.limit.value ? 'pass' : 'fail');
        expect(rel(r.worstValue, worst), `${grade} ${r.id} worst`).toBeLessThan(5e-3);
        expect(Math.abs(r.margin - (r.limit.value - worst)), `${grade} ${r.id} margin`).toBeLessThan(5e-3 * worst);
      }
    }
    // Consumer fails both; tactical passes 0.5° only; navigation passes both.
    expect(slot.outcomes.map((o) => o.requirements.map((r) => r.verdict).join(' '))).toEqual([
      'fail fail',
      'pass fail',
      'pass pass',
    ]);
  });

  it('orders the candidates by heading error as their grades do', () => {
    const worst = (id: Grade) => outcome(id).requirements[0].worstValue;
    expect(worst('consumerMems')).toBeGreaterThan(worst('tactical'));
    expect(worst('tactical')).toBeGreaterThan(worst('navigation'));
  });

  it('gives the time to exceed after the outage starts from the closed form (within 0.5 %)', () => {
    const cases: [Grade, string, number][] = [
      ['consumerMems', 'coarse', 0.5],
      ['consumerMems', 'fine', 0.1],
      ['tactical', 'fine', 0.1],
    ];
    for (const [grade, req, limit] of cases) {
      const hold = outcome(grade).requirements.find((r) => r.id === req)!.outages[0];
      expect(hold.sensorId).toBe('gnss');
      expect(rel(hold.timeToExceedS!, timeToReachS(grade, limit)), `${grade} ${req}`).toBeLessThan(5e-3);
    }
    expect(outcome('navigation').requirements.every((r) => r.outages[0].timeToExceedS === null)).toBe(true);
  });

  it('names the cheapest candidate that passes every requirement', () => {
    expect(slot.cheapestPassing).toBe('navigation');
    expect(slot.currency).toBe('EUR');
    const looser = compareCandidates(gradeCandidates({ coarse: 0.5 })).slots[0];
    expect(looser.outcomes.map((o) => o.passesAll)).toEqual([false, true, true]);
    expect(looser.cheapestPassing).toBe('tactical');
    expect(outcome('tactical').price).toBe(PRICES.tactical);
  });

  it('lists a passing candidate without a price instead of ranking it', () => {
    const d = gradeCandidates({ coarse: 0.5 });
    delete d.candidates![0].options[1].price;
    const s = compareCandidates(d).slots[0];
    expect(s.cheapestPassing).toBe('navigation');
    expect(s.passingUnpriced).toEqual(['tactical']);
  });

  it('overlays each requirement curve per candidate, ending at the closed-form value', () => {
    for (const grade of Object.keys(GRADES) as Grade[]) {
      const curve = outcome(grade).curves.find((c) => c.requirementId === 'coarse')!;
      expect(curve.unit).toBe('deg');
      expect(curve.tS[curve.tS.length - 1]).toBeCloseTo(60, 9);
      expect(rel(curve.values[curve.values.length - 1], headingSigmaDeg(grade, 60))).toBeLessThan(5e-3);
      expect(curve.tS.length).toBeLessThanOrEqual(402);
    }
  });

  it('gives the same comparison from its runs in any order (so runs can be split between machines)', () => {
    const outcomes = candidateRuns(doc)
      .reverse()
      .map((run) => runCandidate(doc, run));
    expect(assembleComparison(doc, outcomes)).toEqual(comparison);
  });

  it('leaves the document as written', () => {
    expect(doc).toEqual(gradeCandidates());
  });
});

describe('candidates in the document', () => {
  it('round-trips through the parser and the writer', () => {
    const text = serializeBudgetDocument(gradeCandidates());
    const parsed = parseBudgetDocument(text, 'grades.json').document;
    expect(parsed.candidates![0].options.map((o) => o.id)).toEqual(['consumerMems', 'tactical', 'navigation']);
    expect(serializeBudgetDocument(parsed)).toBe(text);
  });

  it('refuses an unknown key inside a candidate, naming its path', () => {
    const d = gradeCandidates() as unknown as { candidates: { options: Record<string, unknown>[] }[] };
    d.candidates[0].options[0].cost = 3;
    expect(() => parseBudgetDocument(JSON.stringify(d), 'grades.json')).toThrow(
      /grades\.json: candidates\[0\]\.options\[0\]/,
    );
  });

  it('refuses a slot for a sensor the document lacks, and repeated candidate ids', () => {
    const d = gradeCandidates();
    d.candidates![0].sensor = 'gyro2';
    expect(() => compareCandidates(d, { fileName: 'grades.json' })).toThrow(
      /grades\.json: candidates\[0\]\.sensor: no sensor "gyro2"; the document has gyro, wheel, gnss/,
    );
    const e = gradeCandidates();
    e.candidates![0].options[2].id = 'Tactical';
    expect(() => compareCandidates(e)).toThrow(
      /candidates\[0\]\.options\[2\]\.id: "Tactical" is already used by candidates\[0\]\.options\[1\]\.id/,
    );
  });

  it('reports a candidate whose cell fails as partial, and it does not pass', () => {
    const d = gradeCandidates({ coarse: 0.5 });
    d.candidates![0].options[2].sources[0].value = '=nosuchName';
    const nav = compareCandidates(d).slots[0].outcomes[2];
    expect(nav.status).toBe('partial');
    expect(nav.problems.join('\n')).toMatch(/sensors\[0\]\.sources\[0\]\.value/);
    expect(nav.passesAll).toBe(false);
  });
});
