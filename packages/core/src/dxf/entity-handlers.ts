import type { IEntity, IPoint } from 'dxf-parser';
import type DxfArrayScanner from 'dxf-parser/dist/DxfArrayScanner';
import type { IGroup } from 'dxf-parser/dist/DxfArrayScanner';

/** A SPLINE with the weights (group 41) that dxf-parser 1.1.2 drops. */
export interface WeightedSplineEntity extends IEntity {
  type: 'SPLINE';
  degree: number;
  closed: boolean;
  periodic: boolean;
  rational: boolean;
  knots: number[];
  weights: number[];
  controlPoints: IPoint[];
  fitPoints: IPoint[];
}

/** Any entity type the parser has no handler for: kept only to be counted and reported. */
export interface UnknownEntity extends IEntity {
  unknown: true;
}

interface Handler<T extends IEntity> {
  ForEntityName: string;
  parseEntity(scanner: DxfArrayScanner): T;
}

function readCommon(entity: IEntity, group: IGroup): void {
  if (group.code === 5) entity.handle = group.value as unknown as number;
  else if (group.code === 8) entity.layer = String(group.value);
  else if (group.code === 67) entity.inPaperSpace = group.value !== 0;
}

function readPoint(scanner: DxfArrayScanner, first: IGroup): IPoint {
  const point: IPoint = { x: Number(first.value), y: 0, z: 0 };
  const y = scanner.next();
  if (y.code !== first.code + 10) {
    scanner.rewind();
    return point;
  }
  point.y = Number(y.value);
  const z = scanner.next();
  if (z.code === first.code + 20) point.z = Number(z.value);
  else scanner.rewind();
  return point;
}

/** Reads SPLINE in full: control points, fit points, knots, weights and flags. */
export const splineHandler: Handler<WeightedSplineEntity> = {
  ForEntityName: 'SPLINE',
  parseEntity(scanner) {
    const entity = {
      type: 'SPLINE',
      degree: 3,
      closed: false,
      periodic: false,
      rational: false,
      knots: [],
      weights: [],
      controlPoints: [],
      fitPoints: [],
    } as unknown as WeightedSplineEntity;
    let group = scanner.next();
    while (!scanner.isEOF() && group.code !== 0) {
      const value = group.value;
      switch (group.code) {
        case 10:
          entity.controlPoints.push(readPoint(scanner, group));
          break;
        case 11:
          entity.fitPoints.push(readPoint(scanner, group));
          break;
        case 40:
          entity.knots.push(Number(value));
          break;
        case 41:
          entity.weights.push(Number(value));
          break;
        case 70:
          entity.closed = (Number(value) & 1) !== 0;
          entity.periodic = (Number(value) & 2) !== 0;
          entity.rational = (Number(value) & 4) !== 0;
          break;
        case 71:
          entity.degree = Number(value);
          break;
        default:
          readCommon(entity, group);
      }
      group = scanner.next();
    }
    return entity;
  },
};

/** Stands in for every entity type dxf-parser does not know, so that none goes uncounted. */
export function unknownEntityHandler(type: string): Handler<UnknownEntity> {
  return {
    ForEntityName: type,
    parseEntity(scanner) {
      const entity = { type, unknown: true } as unknown as UnknownEntity;
      let group = scanner.next();
      while (!scanner.isEOF() && group.code !== 0) {
        readCommon(entity, group);
        group = scanner.next();
      }
      return entity;
    },
  };
}

export function isUnknownEntity(entity: IEntity): entity is UnknownEntity {
  return (entity as Partial<UnknownEntity>).unknown === true;
}
