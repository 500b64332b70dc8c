import { Controller, Get, Res } from '@nestjs/common';
import { ApiOkResponse, ApiServiceUnavailableResponse, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Public } from '../auth/public.decorator';
import { HealthDto } from './dto/health.dto';
import { HealthService } from './health.service';

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(private readonly health: HealthService) {}

  @Public()
  @Get()
  @ApiOkResponse({ type: HealthDto, description: 'Database and storage answer' })
  @ApiServiceUnavailableResponse({ type: HealthDto, description: 'The database or the storage is down' })
  async check(@Res({ passthrough: true }) response: Response): Promise<HealthDto> {
    const health = await this.health.check();
    response.status(health.status === 'ok' ? 200 : 503);
    return health;
  }
}
