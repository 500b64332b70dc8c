import type { Licence, LibrarySort, PlanCategory, Tool } from './api/types';
import { isCategory, isLicence, isTool } from './vocabulary';

/** What the library shows: the search, the filters, the sort and the page, all kept in the URL. */
export interface LibraryFilter {
  q: string;
  category: PlanCategory | null;
  tools: Tool[];
  /** null: motorised or not. */
  motorised: boolean | null;
  licence: Licence | null;
  minRating: number | null;
  hasBuilds: boolean;
  sort: LibrarySort;
  page: number;
}

export const LIBRARY_SORT_NAMES: Record<LibrarySort, string> = {
  newest: 'Newest',
  rated: 'Best rated',
  built: 'Most built',
};

const SORTS = Object.keys(LIBRARY_SORT_NAMES) as LibrarySort[];

function wholeNumber(text: string | null, min: number, max: number): number | null {
  const value = Number(text);
  return text !== null && Number.isInteger(value) && value >= min && value <= max ? value : null;
}

/** Reads the filter from the address; anything unknown falls back to "any". */
export function libraryFilterFromSearch(search: URLSearchParams): LibraryFilter {
  const category = search.get('category');
  const licence = search.get('licence');
  const motorised = search.get('motorised');
  const sort = search.get('sort') as LibrarySort | null;
  return {
    q: search.get('q')?.trim() ?? '',
    category: isCategory(category) ? category : null,
    tools: [...new Set((search.get('tools') ?? '').split(',').filter(isTool))],
    motorised: motorised === 'yes' ? true : motorised === 'no' ? false : null,
    licence: isLicence(licence) ? licence : null,
    minRating: wholeNumber(search.get('rating'), 1, 5),
    hasBuilds: search.get('built') === 'yes',
    sort: sort && SORTS.includes(sort) ? sort : 'newest',
    page: wholeNumber(search.get('page'), 1, Number.MAX_SAFE_INTEGER) ?? 1,
  };
}

/** The address of a filter, writing only what differs from the defaults so that links stay short. */
export function librarySearchFromFilter(filter: LibraryFilter): URLSearchParams {
  const search = new URLSearchParams();
  if (filter.q) search.set('q', filter.q);
  if (filter.category) search.set('category', filter.category);
  if (filter.tools.length) search.set('tools', filter.tools.join(','));
  if (filter.motorised !== null) search.set('motorised', filter.motorised ? 'yes' : 'no');
  if (filter.licence) search.set('licence', filter.licence);
  if (filter.minRating !== null) search.set('rating', String(filter.minRating));
  if (filter.hasBuilds) search.set('built', 'yes');
  if (filter.sort !== 'newest') search.set('sort', filter.sort);
  if (filter.page > 1) search.set('page', String(filter.page));
  return search;
}

/** The same filter as the query of `GET /api/plans`. */
export function planListQuery(filter: LibraryFilter, pageSize: number): URLSearchParams {
  const query = new URLSearchParams({ page: String(filter.page), pageSize: String(pageSize), sort: filter.sort });
  if (filter.q) query.set('q', filter.q);
  if (filter.category) query.set('category', filter.category);
  if (filter.tools.length) query.set('tools', filter.tools.join(','));
  if (filter.motorised !== null) query.set('motorised', String(filter.motorised));
  if (filter.licence) query.set('licence', filter.licence);
  if (filter.minRating !== null) query.set('minRating', String(filter.minRating));
  if (filter.hasBuilds) query.set('hasBuilds', 'true');
  return query;
}

/** Whether any filter or search narrows the list (the page and the sort do not). */
export function isNarrowed(filter: LibraryFilter): boolean {
  return Boolean(
    filter.q ||
    filter.category ||
    filter.tools.length ||
    filter.motorised !== null ||
    filter.licence ||
    filter.minRating !== null ||
    filter.hasBuilds,
  );
}
