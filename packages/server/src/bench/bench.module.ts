import { Module, type DynamicModule } from '@nestjs/common';
import { BenchController } from './bench.controller';

@Module({ controllers: [BenchController] })
export class BenchModule {}

/** `GET /api/bench/bare`, only when `BENCH_BARE_ROUTE=true`: `npm run bench` sets it, nothing else does. */
export function benchRoutes(): DynamicModule[] {
  return process.env.BENCH_BARE_ROUTE === 'true' ? [{ module: BenchModule }] : [];
}
