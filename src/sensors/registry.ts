import type { SensorKind } from '../inputs/budget-input';
import { compass } from './compass';
import { gnssPosition } from './gnss-position';
import { rangeBearing } from './range-bearing';
import type { SensorKindSpec } from './sensor-kind';
import { wheelSpeed } from './wheel-speed';
import { yawGyro } from './yaw-gyro';

/**
 * Every sensor kind, in the order the page lists them. Each kind's file
 * declares everything about itself (src/sensors/sensor-kind.ts); this list
 * only says which kinds exist. A kind file that is not listed here fails
 * test/sensors/kind-recipe.test.ts.
 */
export const SENSOR_KINDS: { readonly [K in SensorKind]: SensorKindSpec<K> } = {
  'yaw-gyro': yawGyro,
  'wheel-speed': wheelSpeed,
  'gnss-position': gnssPosition,
  compass,
  'range-bearing': rangeBearing,
};

/** The kinds, in the order the UI lists them. */
export const SENSOR_KIND_NAMES = Object.keys(SENSOR_KINDS) as SensorKind[];
