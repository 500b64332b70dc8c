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
  { name: 'all, best rated', path: '/api/plans?sort=rated' },
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

/** Slow answers are measured, not dropped: autocannon's own 10 s would count them as errors. */
const TIMEOUT_SECONDS = 60;

/**
 * Waits until the server answers a cheap library request quickly again: requests autocannon gave
 * up on at the end of a run are still being answered, and would slow the next run down.
 */
export async function settle(probeUrl: string): Promise<void> {
  const until = Date.now() + TIMEOUT_SECONDS * 1000;
  let quick = 0;
  while (quick < 3 && Date.now() < until) {
    const started = performance.now();
    await (await fetch(probeUrl)).arrayBuffer();
    quick = performance.now() - started < 100 ? quick + 1 : 0;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

/** A short warm-up (JIT, connection pool, InnoDB buffer pool), then the measured run, each followed by a settle. */
export async function load(url: string, probeUrl: string, connections: number, seconds: number): Promise<LoadFigures> {
  await autocannon({ url, connections, duration: Math.min(3, seconds), timeout: TIMEOUT_SECONDS });
  await settle(probeUrl);
  const result = await autocannon({ url, connections, duration: seconds, timeout: TIMEOUT_SECONDS });
  await settle(probeUrl);
  return {
    requestsPerSecond: result.requests.average,
    p50: result.latency.p50,
    p99: result.latency.p99,
    non2xx: result.non2xx,
    errors: result.errors,
  };
}
