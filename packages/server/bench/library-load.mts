import autocannon from 'autocannon';

export interface LibraryQuery {
  name: string;
  path: string;
}

/** Representative library requests: a search alone and with filters, filters alone, and each sort. */
export const LIBRARY_QUERIES: LibraryQuery[] = [
  { name: 'search "crosscut sled"', path: '/api/plans?q=crosscut%20sled' },
  { name: 'search "shop" (every plan), rated', path: '/api/plans?q=shop&sort=rated' },
  { name: 'search + category, licence', path: '/api/plans?q=fence&category=fence&licence=CC-BY-4.0' },
  { name: 'tools + motorised', path: '/api/plans?tools=router-table,table-saw&motorised=true' },
  { name: 'category, page 3', path: '/api/plans?category=indexing-jig&page=3' },
  { name: 'all, newest', path: '/api/plans?sort=newest' },
  { name: 'rating ≥ 4, best rated', path: '/api/plans?minRating=4&sort=rated' },
  { name: 'has builds, most built', path: '/api/plans?hasBuilds=true&sort=built' },
];

/** The route that measures the request pipeline alone (src/bench/bench.controller.ts). */
export const BARE_ROUTE: LibraryQuery = { name: 'bare NestJS route', path: '/api/bench/bare' };

export interface LoadFigures {
  requestsPerSecond: number;
  p50: number;
  p99: number;
  non2xx: number;
  errors: number;
}

/** A short warm-up (JIT, connection pool, InnoDB buffer pool), then the measured run. */
export async function load(url: string, connections: number, seconds: number): Promise<LoadFigures> {
  await autocannon({ url, connections, duration: Math.min(3, seconds) });
  const result = await autocannon({ url, connections, duration: seconds });
  return {
    requestsPerSecond: result.requests.average,
    p50: result.latency.p50,
    p99: result.latency.p99,
    non2xx: result.non2xx,
    errors: result.errors,
  };
}
