import type { AidingKind } from '../inertial-input';
import type { AidingResolver } from './aiding-context';
import { resolveGnssPosition, resolveGnssVelocity } from './gnss-aiding';
import { resolveBarometer, resolveHeadingAid } from './height-heading-aiding';
import { resolveMotionConstraint, resolveOdometer, resolveZeroVelocity } from './motion-aiding';

/** Every aiding kind of the inertial model and its resolver (docs/inertial-model.md §5). */
export const AIDING_KINDS: Readonly<Record<AidingKind, AidingResolver>> = {
  'gnss-position': resolveGnssPosition,
  'gnss-velocity': resolveGnssVelocity,
  'barometer': resolveBarometer,
  'heading-aid': resolveHeadingAid,
  'zero-velocity': resolveZeroVelocity,
  'motion-constraint': resolveMotionConstraint,
  'odometer': resolveOdometer,
};
