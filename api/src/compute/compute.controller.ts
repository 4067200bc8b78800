import type { ComputeRoute } from '@hopwise/common';
import { Body, Controller, HttpCode, Post } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiBody,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
  ApiUnprocessableEntityResponse,
} from '@nestjs/swagger';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { ApiErrorDto } from '../http/api-error.dto.js';
import { RequirePermission } from '../http/require-permission.decorator.js';
import { COMPUTE_DOCS } from './compute-openapi.js';
import { ComputeService } from './compute.service.js';

/** Swagger decorators shared by the five routes; body schemas come from the zod schemas. */
function ComputeDocs(route: ComputeRoute): MethodDecorator {
  const doc = COMPUTE_DOCS[route];
  return (target, key, descriptor) => {
    for (const d of [
      ApiOperation({ summary: doc.summary, description: doc.description }),
      ApiBody({ schema: doc.requestSchema }),
      ApiOkResponse({ schema: doc.responseSchema }),
      ApiBadRequestResponse({ type: ApiErrorDto, description: 'Malformed input; names the field' }),
      ApiUnprocessableEntityResponse({
        type: ApiErrorDto,
        description: 'Well-formed input without a physical answer',
      }),
    ]) {
      d(target, key, descriptor);
    }
  };
}

/**
 * Compute routes create nothing, so they answer 200. The body is taken as `unknown` so the
 * class-validator pipe leaves it alone; the physics core validates it with its zod schemas.
 */
@ApiTags('compute')
@ApiBearerAuth()
@RequirePermission('compute:run')
@Controller('compute')
export class ComputeController {
  constructor(private readonly compute: ComputeService) {}

  @Post('plasma')
  @HttpCode(200)
  @ComputeDocs('plasma')
  plasma(@Body() body: unknown, @CurrentUser() user: AuthUser) {
    return this.compute.run('plasma', body, user);
  }

  @Post('vertical')
  @HttpCode(200)
  @ComputeDocs('vertical')
  vertical(@Body() body: unknown, @CurrentUser() user: AuthUser) {
    return this.compute.run('vertical', body, user);
  }

  @Post('oblique')
  @HttpCode(200)
  @ComputeDocs('oblique')
  oblique(@Body() body: unknown, @CurrentUser() user: AuthUser) {
    return this.compute.run('oblique', body, user);
  }

  @Post('slant')
  @HttpCode(200)
  @ComputeDocs('slant')
  slant(@Body() body: unknown, @CurrentUser() user: AuthUser) {
    return this.compute.run('slant', body, user);
  }

  @Post('invert')
  @HttpCode(200)
  @ComputeDocs('invert')
  invert(@Body() body: unknown, @CurrentUser() user: AuthUser) {
    return this.compute.run('invert', body, user);
  }
}
