// Physical constants, CODATA 2018 exact values (the 2019 SI redefinition fixed both).

/** Boltzmann constant in J/K (CODATA 2018, exact). */
export const BOLTZMANN_J_PER_K = 1.380649e-23;
/** Elementary charge in C (CODATA 2018, exact). */
export const ELEMENTARY_CHARGE_C = 1.602176634e-19;
/** Offset between the Celsius and kelvin scales (SI brochure, exact). */
export const ZERO_CELSIUS_K = 273.15;

/** Thermal voltage VT = kT/q at a temperature in °C. */
export function thermalVoltage(tempC: number): number {
  return (BOLTZMANN_J_PER_K * (tempC + ZERO_CELSIUS_K)) / ELEMENTARY_CHARGE_C;
}
