import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsInt,
  IsNumber,
  IsOptional,
  Max,
  Min,
} from 'class-validator';
import { toNumber, toNumberList } from './profile-fields.js';

export const DEFAULT_COMPARE_RANGES_KM = [1000, 3000];

export class CompareProfilesDto {
  @ApiProperty({ type: [Number], minItems: 2, maxItems: 4, example: [1, 2] })
  @ArrayMaxSize(4, { message: 'ids must list at most 4 profiles' })
  @ArrayMinSize(2, { message: 'ids must list at least 2 profiles' })
  @IsInt({ each: true, message: 'ids must be integers' })
  @IsArray()
  ids!: number[];

  @ApiProperty({ minimum: 0.1, maximum: 100, example: 10 })
  @Max(100)
  @Min(0.1)
  @IsNumber({ allowNaN: false, allowInfinity: false })
  frequencyMHz!: number;

  @ApiPropertyOptional({ type: [Number], default: DEFAULT_COMPARE_RANGES_KM, maxItems: 6 })
  @IsOptional()
  @ArrayMaxSize(6)
  @ArrayMinSize(1)
  @Max(20_000, { each: true, message: 'groundRangesKm must be at most 20000' })
  @Min(1, { each: true, message: 'groundRangesKm must be at least 1' })
  @IsNumber({ allowNaN: false, allowInfinity: false }, { each: true })
  @IsArray()
  groundRangesKm?: number[];
}

/** The same as query parameters: `?ids=1,2&frequencyMHz=10&groundRangesKm=1000,3000`. */
export class CompareProfilesQuery extends CompareProfilesDto {
  @toNumberList()
  override ids!: number[];

  @toNumber()
  override frequencyMHz!: number;

  @toNumberList()
  override groundRangesKm?: number[];
}
