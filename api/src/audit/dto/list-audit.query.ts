import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, Matches, Max, MaxLength, Min } from 'class-validator';

export class ListAuditQuery {
  @ApiPropertyOptional({ default: 50, minimum: 1, maximum: 500 })
  @IsOptional()
  @Type(() => Number)
  @Max(500)
  @Min(1)
  @IsInt()
  limit?: number;

  @ApiPropertyOptional({ default: 0, minimum: 0 })
  @IsOptional()
  @Type(() => Number)
  @Min(0)
  @IsInt()
  offset?: number;

  @ApiPropertyOptional({ description: 'Action or its prefix, e.g. `user` or `profile.publish`' })
  @IsOptional()
  @MaxLength(60)
  @Matches(/^[a-z][a-z0-9_.-]*$/, { message: 'action must be a dotted lower-case verb or prefix' })
  action?: string;

  @ApiPropertyOptional({ description: 'Only changes made by this user id' })
  @IsOptional()
  @Type(() => Number)
  @Min(1)
  @IsInt({ message: 'actorUserId must be an integer' })
  actorUserId?: number;

  @ApiPropertyOptional({ description: 'Exact target, e.g. `user:12`' })
  @IsOptional()
  @MaxLength(80)
  @Matches(/^[a-z][a-z-]*:\d+$/, { message: 'target must look like user:12' })
  target?: string;
}
