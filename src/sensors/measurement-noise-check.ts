/**
 * An aiding sensor's white noise is its R. With R = 0 the update claims a
 * perfect measurement: the innovation variance can vanish and P loses rank
 * (the covariance is singular after the first fix), which once came back as
 * a warning only. A zero white-noise row on an aiding sensor is refused.
 */
import { InputError } from '../errors';
import type { SensorInput } from '../inputs/budget-input';
import type { ErrorModel } from '../covariance/error-model';

/**
 * @throws InputError at the row's value (`sensors[2].sources[0].value`) for
 *   a white-noise row whose every R piece is zero.
 */
export function refuseZeroMeasurementNoise(model: ErrorModel, sensors: SensorInput[]): void {
  for (const src of model.sources) {
    if (src.kind !== 'white-noise' || src.measurementNoise.length === 0) continue;
    if (src.measurementNoise.some((p) => p.varianceSI > 0)) continue;
    const i = sensors.findIndex((s) => s.id === src.sensorId);
    const j = sensors[i]?.sources.findIndex((r) => `${src.sensorId}.${r.id}` === src.id) ?? -1;
    throw new InputError(`sensors[${i}].sources[${j}].value`, `is 0, which tells the filter the ${src.sensorId} measurements are perfect (R = 0 makes the covariance singular); give the sensor's noise, however small`);
  }
}
