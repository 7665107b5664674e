/** The part of jstat (npm `jstat`, no types of its own) the engine uses. */
declare module 'jstat' {
  interface JStat {
    chisquare: { cdf(x: number, degreesOfFreedom: number): number };
    gammaln(a: number): number;
  }
  const jstat: { jStat: JStat };
  export default jstat;
}
