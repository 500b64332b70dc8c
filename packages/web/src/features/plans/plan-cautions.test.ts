import { describe, expect, it } from 'vitest';
import { usualCautions } from './plan-cautions';

describe('the usual cautions', () => {
  it('are there for a power tool, deferring to local codes', () => {
    const points = usualCautions({ motorised: false, tools: ['hand-saw', 'table-saw'] });
    expect(points.some((p) => p.includes('push sticks'))).toBe(true);
    expect(points.some((p) => p.includes('Unplug'))).toBe(true);
    expect(points.at(-1)).toMatch(/Local codes, licensed practice/);
    expect(points.some((p) => p.includes('emergency stop'))).toBe(false);
  });

  it('add mains wiring and the emergency stop when the jig is motorised', () => {
    const points = usualCautions({ motorised: true, tools: ['table-saw'] });
    expect(points.some((p) => p.includes('qualified person'))).toBe(true);
    expect(points.some((p) => p.includes('emergency stop'))).toBe(true);
    expect(usualCautions({ motorised: true, tools: [] }).length).toBe(3);
  });

  it('are not added for hand tools only', () => {
    expect(usualCautions({ motorised: false, tools: ['hand-plane', 'hand-saw'] })).toEqual([]);
  });
});
