/**
 * The 3-D inertial model (docs/inertial-model.md), beside the planar one:
 * input types, the run from input to a budget over time, the Earth
 * constants and the accuracy measures it adds.
 */
export type * from './inertial-input';
export { EARTH, schulerPeriodS, type EarthModel } from './earth';
export { runInertialBudget, type InertialBudget, type InertialRunOptions, type InertialSeries } from './run-inertial';
export { INERTIAL_QUANTITIES, type InertialQuantity } from './inertial-quantities';
export { sphericalErrorProbableM, probabilityInsideSphere } from './sphere-probability';
export type { InertialModel, InertialSource, InertialState } from './inertial-model';
export { AIDING_KIND_NAMES, LEVER_ARM_KINDS, VERTICAL_SIGMA_KINDS, WINDOW_KINDS } from './inertial-input';
export { IMU_ROW_KINDS, IMU_ROW_DIMENSIONS, AIDING_PAGE_SPECS, type AidingPageSpec } from './row-dimensions';
