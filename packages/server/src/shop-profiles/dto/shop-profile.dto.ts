import { ApiProperty } from '@nestjs/swagger';
import { DEFAULT_ALLOWANCES, DEFAULT_BAR_LENGTHS, DEFAULT_KERF, DEFAULT_SHEET } from '@jigwright/core';
import { Transform, Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsIn,
  IsISO4217CurrencyCode,
  IsNumber,
  IsString,
  Length,
  Max,
  Min,
  ValidateNested,
} from 'class-validator';
import { PRICE_UNITS, type PriceUnit, type ShopProfile } from '../entities/shop-profile.entity';

const trimmed = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);

export class SheetSizeDto {
  @ApiProperty({ description: 'mm', minimum: 100, maximum: 6000, example: 2440 })
  @IsNumber({}, { message: 'A sheet length is a number of millimetres.' })
  @Min(100, { message: 'A sheet is at least 100 mm long.' })
  @Max(6000, { message: 'A sheet is at most 6000 mm long.' })
  length: number;

  @ApiProperty({ description: 'mm', minimum: 100, maximum: 6000, example: 1220 })
  @IsNumber({}, { message: 'A sheet width is a number of millimetres.' })
  @Min(100, { message: 'A sheet is at least 100 mm wide.' })
  @Max(6000, { message: 'A sheet is at most 6000 mm wide.' })
  width: number;
}

export class SolidAllowanceDto {
  @ApiProperty({ description: 'mm added to the finished length', minimum: 0, maximum: 200 })
  @IsNumber()
  @Min(0)
  @Max(200)
  length: number;

  @ApiProperty({ description: 'mm added to the finished width', minimum: 0, maximum: 200 })
  @IsNumber()
  @Min(0)
  @Max(200)
  width: number;

  @ApiProperty({ description: 'mm added to the finished thickness', minimum: 0, maximum: 50 })
  @IsNumber()
  @Min(0)
  @Max(50)
  thickness: number;
}

export class StockPriceDto {
  @ApiProperty({ description: 'A material as plans name it, or * for any material', example: 'Baltic birch plywood' })
  @Transform(trimmed)
  @IsString()
  @Length(1, 120, { message: 'Each price needs a material of 1 to 120 characters (or * for any).' })
  material: string;

  @ApiProperty({ enum: PRICE_UNITS, description: 'What the amount buys' })
  @IsIn(PRICE_UNITS, { message: `A price is per ${PRICE_UNITS.join(', ')}.` })
  per: PriceUnit;

  @ApiProperty({ minimum: 0, example: 64.5 })
  @IsNumber({ maxDecimalPlaces: 2 }, { message: 'A price is a number with at most two decimals.' })
  @Min(0)
  @Max(1_000_000)
  amount: number;
}

/** What a member may save: the whole profile at once. */
export class UpdateShopProfileDto {
  @ApiProperty({ description: 'Saw kerf in mm', minimum: 0, maximum: 12, example: 3.2 })
  @IsNumber({}, { message: 'The kerf is a number of millimetres.' })
  @Min(0, { message: 'The kerf cannot be negative.' })
  @Max(12, { message: 'A kerf over 12 mm is not a saw blade.' })
  kerf: number;

  @ApiProperty({ description: 'mm trimmed off each sheet edge before laying out parts', minimum: 0, maximum: 50 })
  @IsNumber()
  @Min(0)
  @Max(50)
  edgeTrim: number;

  @ApiProperty({ type: [SheetSizeDto], description: 'Sheet sizes you can buy, 1 to 6' })
  @IsArray()
  @ArrayMinSize(1, { message: 'Give at least one sheet size.' })
  @ArrayMaxSize(6)
  @ValidateNested({ each: true })
  @Type(() => SheetSizeDto)
  sheets: SheetSizeDto[];

  @ApiProperty({ type: [Number], description: 'Bar lengths of linear stock (T-track, rod, dowel) in mm, 1 to 6' })
  @IsArray()
  @ArrayMinSize(1, { message: 'Give at least one bar length.' })
  @ArrayMaxSize(6)
  @IsNumber({}, { each: true })
  @Min(100, { each: true, message: 'A bar is at least 100 mm long.' })
  @Max(12000, { each: true, message: 'A bar is at most 12000 mm long.' })
  barLengths: number[];

  @ApiProperty({ type: SolidAllowanceDto, description: 'Milling allowance for solid stock' })
  @ValidateNested()
  @Type(() => SolidAllowanceDto)
  solidAllowance: SolidAllowanceDto;

  @ApiProperty({ description: 'ISO 4217 currency code of the prices', example: 'EUR' })
  @Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim().toUpperCase() : value))
  @IsISO4217CurrencyCode({ message: 'The currency is a three-letter ISO 4217 code such as EUR, GBP or USD.' })
  currency: string;

  @ApiProperty({ type: [StockPriceDto], description: 'Up to 40 prices; one per material and unit' })
  @IsArray()
  @ArrayMaxSize(40)
  @ValidateNested({ each: true })
  @Type(() => StockPriceDto)
  prices: StockPriceDto[];
}

export class ShopProfileDto extends UpdateShopProfileDto {
  @ApiProperty({ description: 'false while the member has never saved one: these are the defaults' })
  saved: boolean;

  @ApiProperty({ type: String, format: 'date-time', nullable: true })
  updatedAt: string | null;
}

/** The profile of a member who has not saved one: the cut list's own defaults, no prices. */
export function defaultShopProfile(): ShopProfileDto {
  return {
    kerf: DEFAULT_KERF,
    edgeTrim: 0,
    sheets: [{ ...DEFAULT_SHEET }],
    barLengths: [...DEFAULT_BAR_LENGTHS],
    solidAllowance: { ...DEFAULT_ALLOWANCES.solid },
    currency: 'EUR',
    prices: [],
    saved: false,
    updatedAt: null,
  };
}

export function toShopProfileDto(profile: ShopProfile | null): ShopProfileDto {
  if (!profile) return defaultShopProfile();
  return {
    kerf: profile.kerf,
    edgeTrim: profile.edgeTrim,
    sheets: profile.sheets,
    barLengths: profile.barLengths,
    solidAllowance: profile.solidAllowance,
    currency: profile.currency,
    prices: profile.prices,
    saved: true,
    updatedAt: profile.updatedAt.toISOString(),
  };
}
