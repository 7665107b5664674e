/** The part of jstat 1.9.6 (which ships no types) that the simulation uses. */
declare module 'jstat' {
  export const jStat: {
    chisquare: {
      /** Quantile of the chi-square distribution with `dof` degrees of freedom at probability p. */
      inv(p: number, dof: number): number;
    };
  };
  const jstat: { jStat: typeof jStat };
  export default jstat;
}
