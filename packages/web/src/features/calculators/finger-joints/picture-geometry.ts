import type { BoardName, JointPlan } from '@jigwright/core';

export interface Rect {
  x: number;
  y: number;
  width: number;
  height: number;
}

export interface PassRect extends Rect {
  slot: number;
  pass: number;
}

/** One board's end as drawn, in mm: x across the width from the left edge, y down from the finger tips. */
export interface BoardPicture {
  viewBox: Rect;
  /** The uncut body below the fingers. */
  body: Rect;
  pins: Rect[];
  passes: PassRect[];
  /** Spacing of the background grid, mm. */
  gridStep: number;
}

/** 1, 2 or 5 times a power of ten, the nearest to `target`. */
export function niceStep(target: number): number {
  const power = 10 ** Math.floor(Math.log10(target));
  return [1, 2, 5, 10]
    .map((factor) => factor * power)
    .reduce((best, step) => (Math.abs(Math.log(step / target)) < Math.abs(Math.log(best / target)) ? step : best));
}

/**
 * The stock thickness is no input, so the fingers are drawn as deep as the wider feature (box
 * joints are often cut with fingers as wide as the stock is thick), kept within a readable share of
 * the width. Across the width everything is to scale.
 */
function fingerDepth(plan: Pick<JointPlan, 'width' | 'pin' | 'slot'>): number {
  return Math.min(Math.max(plan.pin, plan.slot, plan.width / 40), plan.width / 6);
}

export function boardPicture(plan: JointPlan, board: BoardName): BoardPicture {
  const { width, kerf } = plan;
  const { pins, passes } = plan.boards[board];
  const depth = fingerDepth(plan);
  const bodyHeight = depth * 0.75;
  const margin = width / 50;
  const left = Math.min(0, ...passes.map((pass) => pass.position)) - margin;
  const right = Math.max(width, ...passes.map((pass) => pass.position + kerf)) + margin;
  return {
    viewBox: { x: left, y: -margin, width: right - left, height: depth + bodyHeight + 2 * margin },
    body: { x: 0, y: depth, width, height: bodyHeight },
    pins: pins.map(([from, to]) => ({ x: from, y: 0, width: to - from, height: depth })),
    passes: passes.map((pass) => ({
      slot: pass.slot,
      pass: pass.pass,
      x: pass.position,
      y: 0,
      width: kerf,
      height: depth,
    })),
    gridStep: niceStep(width / 15),
  };
}
