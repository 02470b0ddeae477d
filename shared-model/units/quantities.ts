/**
 * Plain aliases that document the unit of a number (no run-time cost, no casts).
 * Inside the engine every quantity is in SI base units; temperatures are degrees Celsius and
 * temperature differences are kelvin. Prefixes exist only in units/engineering.ts (parse and format).
 */
export type Volts = number;
export type Amps = number;
export type Ohms = number;
export type Henries = number;
export type Farads = number;
export type Hertz = number;
export type Watts = number;
export type Seconds = number;
export type Coulombs = number;
export type Joules = number;
export type Celsius = number;
export type Kelvin = number;
export type KelvinPerWatt = number;
/** A dimensionless fraction, 0..1 unless stated. */
export type Fraction = number;
