import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { categoryId, GRAIN_RULES, LICENCES, PLAN_CATEGORIES, STOCK_KINDS, TOOLS } from './vocabulary';

interface VocabularyFile {
  categories: string[];
  tools: Array<{ id: string }>;
  licences: Array<{ id: string }>;
  stockKinds: string[];
  grain: string[];
}

const vocabulary = JSON.parse(
  readFileSync(join(__dirname, '../../../../plans-seed/vocabulary.json'), 'utf8'),
) as VocabularyFile;

describe('the plan vocabulary', () => {
  it('has the categories of plans-seed/vocabulary.json, as kebab-case ids', () => {
    expect(vocabulary.categories.map(categoryId)).toEqual([...PLAN_CATEGORIES]);
  });

  it('has its tools, licences, stock kinds and grain rules', () => {
    expect(vocabulary.tools.map((tool) => tool.id)).toEqual([...TOOLS]);
    expect(vocabulary.licences.map((licence) => licence.id)).toEqual([...LICENCES]);
    expect(vocabulary.stockKinds).toEqual([...STOCK_KINDS]);
    expect(vocabulary.grain).toEqual([...GRAIN_RULES]);
  });

  it('knows no category outside the list', () => {
    expect(categoryId('Taper  Jig')).toBe('taper-jig');
    expect(categoryId('dovetail jig')).toBeUndefined();
  });
});
