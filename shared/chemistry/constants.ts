// Physical constants and unit helpers shared by the chemistry core.

/** Gas constant, J K⁻¹ mol⁻¹ (SCIENCE.md §2.1). */
export const R = 8.314462;
export const LN10 = Math.log(10);
/** Reference temperature θ of the buffer table, K (25 °C). */
export const THETA = 298.15;
export const KELVIN_OFFSET = 273.15;

export const kelvin = (celsius: number): number => celsius + KELVIN_OFFSET;
