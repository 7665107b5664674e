import type { SensorKind } from '../inputs/budget-input';
import { compass } from './compass';
import { gnssPosition } from './gnss-position';
import { rangeBearing } from './range-bearing';
import type { SensorKindSpec } from './sensor-kind';
import { wheelSpeed } from './wheel-speed';
import { yawGyro } from './yaw-gyro';

/** Every sensor kind of the planar model. */
export const SENSOR_KINDS: Record<SensorKind, SensorKindSpec> = {
  'yaw-gyro': yawGyro,
  'wheel-speed': wheelSpeed,
  'gnss-position': gnssPosition,
  compass,
  'range-bearing': rangeBearing,
};

/** The kinds, in the order the UI lists them. */
export const SENSOR_KIND_NAMES = Object.keys(SENSOR_KINDS) as SensorKind[];
