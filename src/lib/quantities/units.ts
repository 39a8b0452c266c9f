// Constants the quantities engine shares with its tests and the screens: one place each.

/** g/mol, water (IUPAC standard atomic weights). */
export const WATER_MOLAR_MASS = 18.015;
/** g/mL, water at 20 °C (CRC Handbook of Chemistry and Physics, from memory): the trap's reading. */
export const WATER_DENSITY = 0.998;
export const WATER_DENSITY_TEMPERATURE = 20;

/** Above this percent of theory the trap holds more water than the equation allows. */
export const OVER_THEORY_PERCENT = 105;
/** At or above this percent of theory a levelled-off trap is complete. */
export const COMPLETE_PERCENT = 95;
/** Readings have levelled off when each of the last intervals adds less than this percent of theory. */
export const LEVELLED_STEP_PERCENT = 2;
/** How many last intervals must be flat to call the readings levelled off. */
export const LEVELLED_INTERVALS = 2;
