import type { DimensionType } from '../analysis/types';

const TYPES: readonly DimensionType[] = [
  'rotated',
  'aligned',
  'angular',
  'diameter',
  'radius',
  'angular-3-point',
  'ordinate',
];

/**
 * DIMENSION group 70: the type is value & 0x0F — 0 rotated/horizontal/vertical, 1 aligned,
 * 2 angular, 3 diameter, 4 radius, 5 angular 3-point, 6 ordinate; bit 64 marks an X ordinate
 * (AutoCAD DXF Reference, DIMENSION [read]).
 */
export function dimensionTypeOf(group70: number): DimensionType | undefined {
  return TYPES[(group70 ?? 0) & 0x0f];
}

export function isOrdinateX(group70: number): boolean {
  return ((group70 ?? 0) & 64) !== 0;
}

export function isAngularType(type: DimensionType): boolean {
  return type === 'angular' || type === 'angular-3-point';
}
