import type { IPoint } from 'dxf-parser';
import { dimensionTypeOf, isAngularType, isOrdinateX } from '../dxf/dimension-type';
import { apply, uniformScale } from '../geometry/affine';
import type { FlatDimension } from './flatten-drawing';
import type { AnalysedDimension, AnalysisWarning, DimensionType } from './types';

export interface DimensionOptions {
  /** Largest difference, mm (degrees for angles), between a text override and the measured value. */
  tolerance: number;
  mmPerUnit: number;
}

/** Measured values of every DIMENSION, with a warning where an override's number disagrees. */
export function measureDimensions(
  dimensions: readonly FlatDimension[],
  options: DimensionOptions,
): { dimensions: AnalysedDimension[]; warnings: AnalysisWarning[] } {
  const out: AnalysedDimension[] = [];
  const warnings: AnalysisWarning[] = [];
  for (const { entity, transform, source } of dimensions) {
    const type = dimensionTypeOf(entity.dimensionType ?? 0);
    if (!type) continue;
    const angular = isAngularType(type);
    const scale = uniformScale(transform) ?? Math.sqrt(Math.abs(transform.a * transform.d - transform.b * transform.c));
    const fromGroup = typeof entity.actualMeasurement === 'number' && Number.isFinite(entity.actualMeasurement);
    const raw = fromGroup ? entity.actualMeasurement : fromDefinitionPoints(type, entity);
    if (raw === undefined) continue;
    // Group 42 holds angles in radians [memory]; the definition points give radians too.
    const measured = angular ? (raw * 180) / Math.PI : raw * scale;
    const text = entity.text === undefined || entity.text === '' ? null : String(entity.text);
    const at = entity.middleOfText ? apply(transform, entity.middleOfText) : null;
    out.push({
      type,
      measured,
      unit: angular ? 'deg' : 'mm',
      measuredFrom: fromGroup ? 'group-42' : 'definition-points',
      text,
      at: at ? [at.x, at.y] : null,
      source,
    });
    const mismatch =
      text === null ? undefined : overrideMismatch(text, measured, angular, 1 / options.mmPerUnit, options);
    if (mismatch) warnings.push({ code: 'dimension-text-mismatch', message: mismatch, sources: [source] });
  }
  return { dimensions: out, warnings };
}

function dist(p: IPoint | undefined, q: IPoint | undefined): number | undefined {
  return p && q ? Math.hypot(q.x - p.x, q.y - p.y) : undefined;
}

function angleBetween(ux: number, uy: number, vx: number, vy: number): number {
  return Math.abs(Math.atan2(ux * vy - uy * vx, ux * vx + uy * vy));
}

/** The value from the definition points, in drawing units (radians for angles). */
export function fromDefinitionPoints(
  type: DimensionType,
  d: Partial<{
    anchorPoint: IPoint;
    linearOrAngularPoint1: IPoint;
    linearOrAngularPoint2: IPoint;
    diameterOrRadiusPoint: IPoint;
    angle: number;
    dimensionType: number;
  }>,
): number | undefined {
  const p13 = d.linearOrAngularPoint1;
  const p14 = d.linearOrAngularPoint2;
  const p10 = d.anchorPoint;
  const p15 = d.diameterOrRadiusPoint;
  switch (type) {
    case 'rotated': {
      if (!p13 || !p14) return undefined;
      const a = ((d.angle ?? 0) * Math.PI) / 180;
      return Math.abs((p14.x - p13.x) * Math.cos(a) + (p14.y - p13.y) * Math.sin(a));
    }
    case 'aligned':
      return dist(p13, p14);
    case 'diameter':
    case 'radius':
      return dist(p10, p15);
    case 'angular':
      // Two lines: 13→14 and 10→15.
      return p13 && p14 && p10 && p15
        ? angleBetween(p14.x - p13.x, p14.y - p13.y, p15.x - p10.x, p15.y - p10.y)
        : undefined;
    case 'angular-3-point':
      return p13 && p14 && p15 ? angleBetween(p13.x - p15.x, p13.y - p15.y, p14.x - p15.x, p14.y - p15.y) : undefined;
    case 'ordinate':
      if (!p13 || !p10) return undefined;
      return isOrdinateX(d.dimensionType ?? 0) ? Math.abs(p13.x - p10.x) : Math.abs(p13.y - p10.y);
  }
}

/**
 * Compares the number an override shows with the measured value, in the drawing's own units
 * (what the author typed). The allowance is the tolerance or half a unit in the last digit
 * written, whichever is larger, so "25" on a 24.8 mm length is a rounding, not a disagreement.
 */
function overrideMismatch(
  text: string,
  measured: number,
  angular: boolean,
  unitsPerMm: number,
  options: DimensionOptions,
): string | undefined {
  if (text.includes('<>')) return undefined;
  const match = /[-+]?\d+(?:[.,](\d+))?/.exec(text.replace(/\\[A-Za-z][^;]*;/g, ''));
  if (!match) return undefined;
  const shown = Number(match[0].replace(',', '.'));
  const decimals = match[1]?.length ?? 0;
  const value = angular ? measured : measured * unitsPerMm;
  const allowance = Math.max(angular ? options.tolerance : options.tolerance * unitsPerMm, 0.5 * 10 ** -decimals);
  if (Math.abs(shown - value) <= allowance) return undefined;
  const unit = angular ? '°' : '';
  return `dimension text "${text}" disagrees with the measured ${round(value)}${unit}`;
}

function round(value: number): number {
  return Math.round(value * 1000) / 1000;
}
