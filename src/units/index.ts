/**
 * Trade units: parsing datasheet unit texts, converting values to and from
 * SI with the dimension checked, provenance records of each conversion, and
 * the noise-density conventions. A leaf module: it imports only the error
 * types, and every other module may import it.
 */
export {
  DIMENSIONLESS,
  dimension,
  formatDimension,
  multiplyDimensions,
  raiseDimension,
  sameDimension,
  type Dimension,
} from './dimension';
export { UNIT_ATOMS, findAtom, spellingInOtherCase, type UnitAtom } from './unit-atoms';
export { parseUnit, readUnit, unitProblemMessage, type ParsedUnit, type UnitReading } from './parse-unit';
export {
  DIMENSIONS,
  DIMENSION_NAMES,
  describeExpected,
  dimensionOf,
  isDimensionName,
  labelWithArticle,
  unitDimension,
  type DimensionName,
  type NamedDimension,
} from './named-dimensions';
export { convert, fromSI, toSI, unitFor } from './to-si';
export { formatSignificant } from './format-significant';
export { describeConversion, withUnit, type ConversionRecord } from './describe-conversion';
export {
  densityFromRandomWalk,
  randomWalkFromDensity,
  randomWalkFromSampleSigma,
  sampleSigmaFromRandomWalk,
  type DensitySides,
} from './noise-density';
