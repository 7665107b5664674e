/** Least-squares slope of log(time) against log(size): the growth exponent the benchmarks quote. */
export function growthExponent(points: [number, number][]): number {
  const xs = points.map(([x]) => Math.log(x)), ys = points.map(([, y]) => Math.log(y));
  const mx = xs.reduce((a, b) => a + b) / xs.length, my = ys.reduce((a, b) => a + b) / ys.length;
  let sxy = 0, sxx = 0;
  xs.forEach((x, i) => { sxy += (x - mx) * (ys[i] - my); sxx += (x - mx) ** 2; });
  return sxy / sxx;
}
