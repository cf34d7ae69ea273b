/** 0 °C in kelvin, exact by the definition of the degree Celsius (BIPM SI Brochure, 9th ed., 2019, 2.3.1). */
export const ZERO_CELSIUS_IN_KELVIN = 273.15;

/** T[K] = T[°C] + 273.15. The API speaks °C; the engine works in kelvin inside. */
export function celsiusToKelvin(celsius: number): number {
  return celsius + ZERO_CELSIUS_IN_KELVIN;
}

/** T[°C] = T[K] − 273.15. */
export function kelvinToCelsius(kelvin: number): number {
  return kelvin - ZERO_CELSIUS_IN_KELVIN;
}
