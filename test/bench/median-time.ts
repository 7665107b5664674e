/**
 * Median wall time of `repeats` runs, in ms, after `warmUps` unmeasured runs
 * (JIT, generated kernels). The benchmarks quote medians: the machines are noisy.
 */
export function medianMs(run: () => void, repeats: number, warmUps = 0): number {
  for (let i = 0; i < warmUps; i++) run();
  const times: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const t = performance.now();
    run();
    times.push(performance.now() - t);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)];
}
