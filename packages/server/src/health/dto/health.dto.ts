import { ApiProperty } from '@nestjs/swagger';

export class DependencyHealthDto {
  @ApiProperty({ enum: ['up', 'down'] })
  status: 'up' | 'down';

  @ApiProperty({ required: false })
  error?: string;
}

export class HealthDto {
  @ApiProperty({ enum: ['ok', 'degraded'] })
  status: 'ok' | 'degraded';

  @ApiProperty()
  database: DependencyHealthDto;

  @ApiProperty()
  storage: DependencyHealthDto;
}
