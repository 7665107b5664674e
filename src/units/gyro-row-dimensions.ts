import type { DimensionName } from './named-dimensions';

/**
 * Dimensions a gyro datasheet row's magnitude may have, by row kind (the
 * first is a new row's): shared by the planar yaw gyro and the 3-D IMU's
 * gyro rows, which read the same datasheet lines.
 */
export const GYRO_ROW_DIMENSIONS = {
  'white-noise': ['angle-random-walk', 'angular-rate'],
  'bias-instability': ['angular-rate'],
  'rate-random-walk': ['rate-random-walk'],
  'turn-on-bias': ['angular-rate'],
  'scale-factor': ['ratio'],
  quantisation: ['angular-rate', 'angle'],
} satisfies Record<string, DimensionName[]>;
