import { booleanSearchOf } from './search-query';

describe('booleanSearchOf', () => {
  it('requires every word, as a word or a prefix', () => {
    expect(booleanSearchOf('Crosscut  sled')).toBe('+crosscut* +sled*');
  });

  it('drops operators, so that typed text cannot change the query', () => {
    expect(booleanSearchOf('-fence +"taper jig" (sled)* ~@8')).toBe('+fence* +taper* +jig* +sled*');
  });

  it('drops words the index does not hold: stopwords and words under three letters', () => {
    expect(booleanSearchOf('the jig for a box joint')).toBe('+jig* +box* +joint*');
    expect(booleanSearchOf('a to of')).toBeNull();
    expect(booleanSearchOf('   ')).toBeNull();
  });

  it('keeps letters outside ASCII', () => {
    expect(booleanSearchOf('Gehrungsschlitten für Fräse')).toBe('+gehrungsschlitten* +für* +fräse*');
  });
});
