import { applyDecorators } from '@nestjs/common';
import { ArrayMaxSize, ArrayMinSize, IsArray, IsInt, Max, Min } from 'class-validator';

export const MAX_NET_CHANNELS = 50;
export const MAX_NET_MEMBERS = 30;

/** Channels [kHz]: 1–50 integers from 3000 to 30000 (duplicates are dropped by the service). */
export const ChannelsField = () =>
  applyDecorators(
    IsArray({ message: 'channelsKHz must be an array of channels in kHz' }),
    ArrayMinSize(1, { message: 'channelsKHz must list 1 to 50 channels' }),
    ArrayMaxSize(MAX_NET_CHANNELS, { message: 'channelsKHz must list 1 to 50 channels' }),
    IsInt({ each: true, message: 'channelsKHz must be whole numbers of kHz' }),
    Min(3000, { each: true, message: 'channelsKHz must be from 3000 to 30000 kHz' }),
    Max(30000, { each: true, message: 'channelsKHz must be from 3000 to 30000 kHz' }),
  );

export const MembersField = () =>
  applyDecorators(
    IsArray({ message: 'memberStationIds must be an array of station ids' }),
    ArrayMinSize(1, { message: 'memberStationIds must list 1 to 30 stations' }),
    ArrayMaxSize(MAX_NET_MEMBERS, { message: 'memberStationIds must list 1 to 30 stations' }),
    IsInt({ each: true, message: 'memberStationIds must be integer station ids' }),
    Min(1, { each: true, message: 'memberStationIds must be integer station ids' }),
  );
