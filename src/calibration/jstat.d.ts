/** The part of jstat (npm `jstat`, no types of its own) the engine uses: the residual whiteness test and the simulation's χ² bounds. */
declare module 'jstat' {
  interface JStat {
    chisquare: {
      cdf(x: number, degreesOfFreedom: number): number;
      /** Quantile of the chi-square distribution with `degreesOfFreedom` at probability p. */
      inv(p: number, degreesOfFreedom: number): number;
    };
    gammaln(a: number): number;
  }
  const jstat: { jStat: JStat };
  export default jstat;
}
