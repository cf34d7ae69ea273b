/** Units: SI constants, °C ↔ K, and the parser and formatter of quantities with SI prefixes. */
export { k, q, epsilon0, epsilonRSiO2, epsilonRSi } from './constants.js';
export { ZERO_CELSIUS_IN_KELVIN, celsiusToKelvin, kelvinToCelsius } from './temperature.js';
export { SI_PREFIXES, MICRO, type SiPrefix } from './prefixes.js';
export { parseQuantity, type ParsedQuantity } from './parse-quantity.js';
export { formatQuantity, type FormatOptions } from './format-quantity.js';
export {
  readUnit,
  sameDimension,
  formatDimension,
  describeDimension,
  UNIT_SYMBOLS,
  type UnitExpression,
  type UnitReading,
} from './unit-expression.js';
