/** How the screw's two ends are held by their bearings. */
export type ScrewFixity = 'fixed-free' | 'pinned-pinned' | 'fixed-pinned' | 'fixed-fixed';

export const SCREW_FIXITIES: readonly ScrewFixity[] = ['fixed-free', 'pinned-pinned', 'fixed-pinned', 'fixed-fixed'];

/** λ² of a uniform beam's first bending mode (Blevins, Formulas for Natural Frequency and Mode Shape; from memory). */
export const FIXITY_LAMBDA_SQUARED: Readonly<Record<ScrewFixity, number>> = {
  'fixed-free': 3.516,
  'pinned-pinned': 9.87,
  'fixed-pinned': 15.42,
  'fixed-fixed': 22.37,
};

export interface ScrewMaterial {
  /** Young's modulus, Pa. */
  youngsModulus: number;
  /** Density, kg/m³. */
  density: number;
}

export const STEEL: ScrewMaterial = { youngsModulus: 206e9, density: 7850 };

/** Run a screw at no more than this share of its critical speed (common practice). */
export const WHIRLING_SAFE_FRACTION = 0.8;

export interface ScrewGeometry {
  /** Root (minor) diameter, mm. */
  rootDiameter: number;
  /** Unsupported length between bearings, mm. */
  length: number;
  fixity: ScrewFixity;
}

export interface WhirlingOptions {
  material?: ScrewMaterial;
}

/**
 * Critical speed of the screw taken as a solid round beam of its root diameter:
 * f = λ²/(2πL²)·√(EI/ρA), with √(I/A) = d/4 for a solid round section.
 */
export function whirlingSpeedRpm(screw: ScrewGeometry, { material = STEEL }: WhirlingOptions = {}): number {
  const diameter = screw.rootDiameter / 1000;
  const length = screw.length / 1000;
  const hertz =
    (FIXITY_LAMBDA_SQUARED[screw.fixity] / (2 * Math.PI * length ** 2)) *
    (diameter / 4) *
    Math.sqrt(material.youngsModulus / material.density);
  return hertz * 60;
}
