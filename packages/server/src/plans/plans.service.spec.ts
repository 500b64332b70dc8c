import { slugOf } from './plans.service';

describe('slugOf', () => {
  it('makes a lower-case, hyphenated slug from a title, dropping accents and punctuation', () => {
    expect(slugOf('Crosscut Sled — squared by the 5-cut check!')).toBe('crosscut-sled-squared-by-the-5-cut-check');
    expect(slugOf('Gehrungsschlitten für die Fräse')).toBe('gehrungsschlitten-fur-die-frase');
  });

  it('keeps slugs to 60 characters without a trailing hyphen', () => {
    const slug = slugOf(`${'a'.repeat(59)} b`);
    expect(slug).toBe('a'.repeat(59));
    expect(slugOf('x'.repeat(80))).toHaveLength(60);
  });

  it('falls back to "plan" for a title with no letters or digits', () => {
    expect(slugOf('— ★ —')).toBe('plan');
  });
});
