import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

/** The body of every error the API sends. */
export class ApiErrorDto {
  @ApiProperty({ example: 403 })
  statusCode: number;

  @ApiProperty({ example: 'role_required', description: 'Stable, machine-readable' })
  code: string;

  @ApiProperty({ example: 'This needs the admin role.' })
  message: string;

  @ApiPropertyOptional({ description: 'More about the failure, such as the fields that did not validate' })
  details?: unknown;
}
