import { Body, Controller, HttpCode, Post } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiBody,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
} from '@nestjs/swagger';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { ApiErrorDto } from '../http/api-error.dto.js';
import { RequirePermission } from '../http/require-permission.decorator.js';
import { PlanService } from './plan.service.js';

const PLAN_BODY_SCHEMA = {
  type: 'object',
  required: ['dateUtc', 'channelsKHz', 'profileSource'],
  properties: {
    linkId: { type: 'integer', description: 'a link you can see (or give from and to)' },
    from: {
      type: 'object',
      properties: { latDeg: { type: 'number' }, lonDeg: { type: 'number' } },
    },
    to: { type: 'object', properties: { latDeg: { type: 'number' }, lonDeg: { type: 'number' } } },
    dateUtc: { type: 'string', example: '2026-03-20', description: 'UTC day (YYYY-MM-DD)' },
    channelsKHz: {
      type: 'array',
      items: { type: 'integer', minimum: 3000, maximum: 30000 },
      minItems: 1,
      maxItems: 50,
    },
    profileSource: {
      oneOf: [
        { type: 'string', enum: ['model', 'feed'] },
        { type: 'object', properties: { profileId: { type: 'integer' } } },
      ],
    },
    slotMinutes: { type: 'integer', enum: [15, 30, 60], default: 60 },
  },
};

/** Compute routes create nothing, so they answer 200 (SPEC §3). */
@ApiTags('compute')
@ApiBearerAuth()
@RequirePermission('compute:run')
@Controller('compute')
export class PlanController {
  constructor(private readonly plans: PlanService) {}

  @Post('plan')
  @HttpCode(200)
  @ApiOperation({
    summary: '24-hour channel plan for a link (MUF per hop count, OWF, usable and best channel)',
    description:
      'OWF = 0.85 × the highest MUF (common practice). Predictions are estimates; transmit only on channels your licence or assignment allows.',
  })
  @ApiBody({ schema: PLAN_BODY_SCHEMA })
  @ApiOkResponse({
    description:
      '{ slots: [{ startUtc, mufMHz, owfMHz, usableChannelsKHz, bestChannelKHz, modes }] }',
  })
  @ApiBadRequestResponse({ type: ApiErrorDto, description: 'Malformed input; names the field' })
  plan(@Body() body: unknown, @CurrentUser() user: AuthUser) {
    return this.plans.planFromBody(body, user);
  }
}
