import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, Max, Min } from 'class-validator';

/** `?page=&pageSize=` of every paginated list. */
export class PageQueryDto {
  @ApiPropertyOptional({ minimum: 1, default: 1 })
  @Type(() => Number)
  @IsInt()
  @Min(1)
  page: number = 1;

  @ApiPropertyOptional({ minimum: 1, maximum: 100, default: 20 })
  @Type(() => Number)
  @IsInt()
  @Min(1)
  @Max(100)
  pageSize: number = 20;
}

/** What every paginated list carries besides its items. */
export class PageMetaDto {
  @ApiProperty({ description: 'How many items match, over all pages' })
  total: number;

  @ApiProperty()
  page: number;

  @ApiProperty()
  pageSize: number;
}

export function pageMeta(query: PageQueryDto, total: number): PageMetaDto {
  return { total, page: query.page, pageSize: query.pageSize };
}

export function skipOf(query: PageQueryDto): number {
  return (query.page - 1) * query.pageSize;
}
