import { MM_PER_INCH } from './length';

/** Names of the drawing units a DXF file can declare in `$INSUNITS`, plus `unknown`. */
export type DrawingUnits =
  | 'unknown'
  | 'in'
  | 'ft'
  | 'mi'
  | 'mm'
  | 'cm'
  | 'm'
  | 'km'
  | 'microinch'
  | 'mil'
  | 'yd'
  | 'angstrom'
  | 'nm'
  | 'micron'
  | 'dm'
  | 'dam'
  | 'hm'
  | 'Gm'
  | 'au'
  | 'ly'
  | 'pc'
  | 'us-survey-ft'
  | 'us-survey-in'
  | 'us-survey-yd'
  | 'us-survey-mi';

const MM_PER_FOOT = 12 * MM_PER_INCH;
const MM_PER_METRE = 1000;
// The US survey foot is 1200/3937 m (NIST, as it stood until 2022).
const MM_PER_US_SURVEY_FOOT = (1200 / 3937) * MM_PER_METRE;
const MM_PER_AU = 149_597_870_700 * MM_PER_METRE;
const MM_PER_LIGHT_YEAR = 9_460_730_472_580_800 * MM_PER_METRE;
const MM_PER_PARSEC = (648_000 / Math.PI) * MM_PER_AU;

interface UnitsEntry {
  code: number;
  units: DrawingUnits;
  mmPerUnit: number;
}

const TABLE: readonly UnitsEntry[] = [
  { code: 1, units: 'in', mmPerUnit: MM_PER_INCH },
  { code: 2, units: 'ft', mmPerUnit: MM_PER_FOOT },
  { code: 3, units: 'mi', mmPerUnit: 5280 * MM_PER_FOOT },
  { code: 4, units: 'mm', mmPerUnit: 1 },
  { code: 5, units: 'cm', mmPerUnit: 10 },
  { code: 6, units: 'm', mmPerUnit: MM_PER_METRE },
  { code: 7, units: 'km', mmPerUnit: 1000 * MM_PER_METRE },
  { code: 8, units: 'microinch', mmPerUnit: MM_PER_INCH / 1e6 },
  { code: 9, units: 'mil', mmPerUnit: MM_PER_INCH / 1000 },
  { code: 10, units: 'yd', mmPerUnit: 3 * MM_PER_FOOT },
  { code: 11, units: 'angstrom', mmPerUnit: 1e-7 },
  { code: 12, units: 'nm', mmPerUnit: 1e-6 },
  { code: 13, units: 'micron', mmPerUnit: 1e-3 },
  { code: 14, units: 'dm', mmPerUnit: 100 },
  { code: 15, units: 'dam', mmPerUnit: 10 * MM_PER_METRE },
  { code: 16, units: 'hm', mmPerUnit: 100 * MM_PER_METRE },
  { code: 17, units: 'Gm', mmPerUnit: 1e9 * MM_PER_METRE },
  { code: 18, units: 'au', mmPerUnit: MM_PER_AU },
  { code: 19, units: 'ly', mmPerUnit: MM_PER_LIGHT_YEAR },
  { code: 20, units: 'pc', mmPerUnit: MM_PER_PARSEC },
  { code: 21, units: 'us-survey-ft', mmPerUnit: MM_PER_US_SURVEY_FOOT },
  { code: 22, units: 'us-survey-in', mmPerUnit: MM_PER_US_SURVEY_FOOT / 12 },
  { code: 23, units: 'us-survey-yd', mmPerUnit: 3 * MM_PER_US_SURVEY_FOOT },
  { code: 24, units: 'us-survey-mi', mmPerUnit: 5280 * MM_PER_US_SURVEY_FOOT },
];

/** Units named by a `$INSUNITS` code; 0, a missing or an unlisted code are `unknown`. */
export function unitsFromInsunits(code: number | undefined): DrawingUnits {
  return TABLE.find((entry) => entry.code === code)?.units ?? 'unknown';
}

/** Millimetres in one drawing unit; undefined for `unknown`, which must never be guessed silently. */
export function mmPerDrawingUnit(units: DrawingUnits): number | undefined {
  return TABLE.find((entry) => entry.units === units)?.mmPerUnit;
}

/** Reads a units name as a person types it (`mm`, `in`, `inch`, `ft`…); undefined when not a unit. */
export function parseDrawingUnits(text: string): DrawingUnits | undefined {
  const name = text.trim().toLowerCase();
  const alias: Record<string, DrawingUnits> = {
    inch: 'in',
    inches: 'in',
    '"': 'in',
    foot: 'ft',
    feet: 'ft',
    millimetre: 'mm',
    millimeter: 'mm',
    centimetre: 'cm',
    centimeter: 'cm',
    metre: 'm',
    meter: 'm',
    yard: 'yd',
    mile: 'mi',
  };
  const found = TABLE.find((entry) => entry.units.toLowerCase() === name);
  return found?.units ?? alias[name];
}
