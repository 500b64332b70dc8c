import { Controller, Get } from '@nestjs/common';
import { ApiExcludeController } from '@nestjs/swagger';
import { Public } from '../auth/public.decorator';

/**
 * A route that does nothing but pass through the app's whole request pipeline (helmet, cookies,
 * guards, logging, the exception filter), so that the benchmark can say how much of a library
 * request's time is the library's own. Served only when the benchmark starts the server.
 */
@ApiExcludeController()
@Controller('bench')
export class BenchController {
  @Public()
  @Get('bare')
  bare(): { ok: true } {
    return { ok: true };
  }
}
