import { describe, expect, it } from 'vitest';
import { blockCount, pushNode, reduceNodes, shardBlocks, type BlockNode } from '../../src/simulation/block-tree';
import { runBlocks } from '../../src/simulation/run-blocks';
import type { StudySums } from '../../src/simulation/study-sums';
import { InputError } from '../../src/errors';
import { seededRandom } from '../fixtures/seeded-random';
import { fixtureModel } from './fixture-model';

/** Leaves of random sums spread over many magnitudes, where the order of additions shows in the last bits. */
function leaves(blocks: number): BlockNode[] {
  const rnd = seededRandom(11);
  return Array.from({ length: blocks }, (_, index) => ({
    level: 0, index,
    sums: { runs: 64, data: Float64Array.from({ length: 16 }, () => (rnd() - 0.5) * 10 ** Math.floor(rnd() * 12)) },
  }));
}

/** What a shard holds: its leaves pushed in order. */
function shardNodes(all: BlockNode[], first: number, end: number, blocks: number): BlockNode[] {
  const stack: BlockNode[] = [];
  for (let b = first; b < end; b++) pushNode(stack, all[b], blocks);
  return stack;
}

const sameBits = (a: StudySums, b: StudySums) => {
  expect(a.runs).toBe(b.runs);
  expect(Buffer.from(a.data.buffer).equals(Buffer.from(b.data.buffer))).toBe(true);
};

describe('the fixed summation tree', () => {
  it('gives the same bits for any split into contiguous shards', () => {
    for (const blocks of [1, 2, 5, 13, 64, 100]) {
      const all = leaves(blocks);
      const whole = reduceNodes(shardNodes(all, 0, blocks, blocks), blocks);
      for (const shards of [2, 3, 4, 7]) {
        const parts = Array.from({ length: shards }, (_, i) => {
          const runs = blocks * 64;
          const [a, b] = shardBlocks(runs, i, shards);
          return shardNodes(all, a, b, blocks);
        });
        sameBits(reduceNodes(parts.reverse().flat(), blocks), whole);
      }
    }
  });

  it('differs from plain left-to-right summation in the last bits (so the test above can fail)', () => {
    // Common practice, no source: floating-point addition is not associative.
    const all = leaves(13);
    const tree = reduceNodes(shardNodes(all, 0, 13, 13), 13);
    const plain = new Float64Array(16);
    for (const l of all) for (let i = 0; i < 16; i++) plain[i] += l.sums.data[i];
    expect(Buffer.from(plain.buffer).equals(Buffer.from(tree.data.buffer))).toBe(false);
  });

  it('refuses parts that leave runs out or hold some twice', () => {
    const all = leaves(8);
    expect(() => reduceNodes(shardNodes(all, 0, 6, 8), 8)).toThrow(/runs from 384 are missing/);
    expect(() => reduceNodes([...shardNodes(all, 0, 5, 8), ...shardNodes(all, 4, 8, 8)], 8)).toThrow(InputError);
  });
});

describe('sharded simulation', () => {
  it('4 shards merged equal one run bit for bit (130 runs of the linear fixture: 3 blocks, one shard empty)', () => {
    const model = fixtureModel('linear-gnss');
    const runs = 130, blocks = blockCount(runs);
    const whole = reduceNodes(runBlocks(model, { seed: 5, runs, firstBlock: 0, endBlock: blocks }), blocks);
    const parts = [0, 1, 2, 3].flatMap((i) => {
      const [firstBlock, endBlock] = shardBlocks(runs, i, 4);
      return runBlocks(model, { seed: 5, runs, firstBlock, endBlock });
    });
    sameBits(reduceNodes(parts, blocks), whole);
    expect(whole.runs).toBe(130);
  }, 120_000);
});
