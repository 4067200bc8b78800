import { ApiPropertyOptional } from '@nestjs/swagger';
import { ArrayMaxSize, IsArray, IsInt, IsOptional, Max, Min } from 'class-validator';

const MIN_KHZ = 3000;
const MAX_KHZ = 30000;

export class FollowLinkDto {
  @ApiPropertyOptional({
    type: [Number],
    example: [5350, 7150, 10150],
    description: `Channels (kHz, ${MIN_KHZ}–${MAX_KHZ}) the watch plans for this link`,
  })
  @IsOptional()
  @IsArray({ message: 'channelsKHz must be an array of channels in kHz' })
  @ArrayMaxSize(40)
  @IsInt({ each: true, message: 'channelsKHz must hold integer kHz values' })
  @Min(MIN_KHZ, { each: true, message: `channelsKHz values must be at least ${MIN_KHZ}` })
  @Max(MAX_KHZ, { each: true, message: `channelsKHz values must be at most ${MAX_KHZ}` })
  channelsKHz?: number[];

  @ApiPropertyOptional({ example: 7150, description: 'The channel you work on (kHz)' })
  @IsOptional()
  @IsInt({ message: 'watchChannelKHz must be an integer kHz value' })
  @Min(MIN_KHZ, { message: `watchChannelKHz must be at least ${MIN_KHZ}` })
  @Max(MAX_KHZ, { message: `watchChannelKHz must be at most ${MAX_KHZ}` })
  watchChannelKHz?: number;
}
