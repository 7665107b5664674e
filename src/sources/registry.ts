import type { SourceKind } from '../inputs/budget-input';
import { biasInstabilitySpec } from './bias-instability';
import { multipathSpec } from './multipath';
import { quantisationSpec } from './quantisation';
import { rateRandomWalkSpec } from './rate-random-walk';
import { scaleFactorSpec } from './scale-factor';
import type { SourceKindSpec } from './source-kind';
import { turnOnBiasSpec } from './turn-on-bias';
import { whiteNoiseSpec } from './white-noise';

/** Every error-source kind, with its parameters and valid ranges (for the grid, the docs and validation). */
export const SOURCE_KINDS: Record<SourceKind, SourceKindSpec> = {
  'white-noise': whiteNoiseSpec,
  'bias-instability': biasInstabilitySpec,
  'rate-random-walk': rateRandomWalkSpec,
  'turn-on-bias': turnOnBiasSpec,
  'scale-factor': scaleFactorSpec,
  quantisation: quantisationSpec,
  multipath: multipathSpec,
};

/** The kinds, in the order the grid lists them. */
export const SOURCE_KIND_NAMES = Object.keys(SOURCE_KINDS) as SourceKind[];
