import { Controller, Get, HttpCode, NotFoundException, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiOperation, ApiTags } from '@nestjs/swagger';
import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsISO8601, IsNumber, IsOptional, Max, Min } from 'class-validator';
import { RequirePermission } from '../http/require-permission.decorator.js';
import { ConditionsService } from './conditions.service.js';

export class PointQuery {
  @ApiProperty({ minimum: -90, maximum: 90 })
  @Type(() => Number)
  @IsNumber({}, { message: 'must be a number' })
  @Min(-90)
  @Max(90)
  latDeg!: number;

  @ApiProperty({ minimum: -180, maximum: 180 })
  @Type(() => Number)
  @IsNumber({}, { message: 'must be a number' })
  @Min(-180)
  @Max(180)
  lonDeg!: number;
}

export class ModelQuery extends PointQuery {
  @ApiProperty({ required: false, description: 'ISO 8601 UTC time (default now)' })
  @IsOptional()
  @IsISO8601({ strict: true }, { message: 'must be an ISO 8601 time' })
  atUtc?: string;
}

@ApiTags('conditions')
@ApiBearerAuth()
@Controller('conditions')
export class ConditionsController {
  constructor(private readonly conditions: ConditionsService) {}

  @Post('poll')
  @HttpCode(200)
  @RequirePermission('nets:manage')
  @ApiOperation({
    summary: 'Poll the conditions feed now (503 if it is unreachable; nothing is lost)',
  })
  poll() {
    return this.conditions.poll();
  }

  @Get('latest')
  @RequirePermission('compute:run')
  @ApiOperation({ summary: 'The latest feed profile of the region nearest a point' })
  latest(@Query() q: PointQuery) {
    const latest = this.conditions.latestFeedProfile({ latDeg: q.latDeg, lonDeg: q.lonDeg });
    if (!latest) throw new NotFoundException('No conditions feed update has been received yet');
    return latest;
  }

  @Get('model')
  @RequirePermission('compute:run')
  @ApiOperation({ summary: 'The built-in diurnal model at a point and time (approximate)' })
  model(@Query() q: ModelQuery) {
    return this.conditions.model(
      { latDeg: q.latDeg, lonDeg: q.lonDeg },
      q.atUtc ? new Date(q.atUtc) : new Date(),
    );
  }
}
