import jstat from 'jstat';

/**
 * Quantile of the chi-square distribution (jstat's jStat.chisquare.inv, via
 * its inverse regularised incomplete gamma). Checked in the tests against a
 * second library and table values; @stdlib's chi-square quantile 0.2.3 was
 * tried first and is 6e-5 off at 5,000 degrees of freedom.
 * @param p probability in (0, 1).
 * @param dof degrees of freedom, > 0.
 */
export function chiSquareQuantile(p: number, dof: number): number {
  return jstat.jStat.chisquare.inv(p, dof);
}
