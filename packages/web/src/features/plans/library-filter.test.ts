import { describe, expect, it } from 'vitest';
import { isNarrowed, libraryFilterFromSearch, librarySearchFromFilter, planListQuery } from './library-filter';

describe('the library filter in the URL', () => {
  it('reads every filter and writes it back unchanged', () => {
    const search = new URLSearchParams(
      'q=sled&category=taper-jig&tools=table-saw,band-saw&motorised=no&licence=CC0-1.0&rating=4&built=yes&sort=rated&page=3',
    );
    const filter = libraryFilterFromSearch(search);
    expect(filter).toEqual({
      q: 'sled',
      category: 'taper-jig',
      tools: ['table-saw', 'band-saw'],
      motorised: false,
      licence: 'CC0-1.0',
      minRating: 4,
      hasBuilds: true,
      sort: 'rated',
      page: 3,
    });
    expect(librarySearchFromFilter(filter).toString()).toBe(search.toString());
  });

  it('drops what it does not know instead of sending it to the server', () => {
    const filter = libraryFilterFromSearch(
      new URLSearchParams('category=spaceship&tools=laser,router&rating=9&sort=cheapest&page=-2&motorised=maybe'),
    );
    expect(filter).toMatchObject({
      category: null,
      tools: ['router'],
      minRating: null,
      sort: 'newest',
      page: 1,
      motorised: null,
    });
    expect(librarySearchFromFilter(filter).toString()).toBe('tools=router');
  });

  it('writes the defaults as an empty address', () => {
    const filter = libraryFilterFromSearch(new URLSearchParams());
    expect(librarySearchFromFilter(filter).toString()).toBe('');
    expect(isNarrowed(filter)).toBe(false);
    expect(isNarrowed({ ...filter, sort: 'built', page: 2 })).toBe(false);
    expect(isNarrowed({ ...filter, motorised: false })).toBe(true);
  });

  it('asks the API in its own names', () => {
    const filter = libraryFilterFromSearch(new URLSearchParams('motorised=yes&rating=3&built=yes&q=fence'));
    expect(Object.fromEntries(planListQuery(filter, 12))).toEqual({
      page: '1',
      pageSize: '12',
      sort: 'newest',
      q: 'fence',
      motorised: 'true',
      minRating: '3',
      hasBuilds: 'true',
    });
  });
});
