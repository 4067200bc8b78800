import type { ApiErrorBody } from '@hopwise/common';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

/** OpenAPI description of the one error shape. */
export class ApiErrorDto implements ApiErrorBody {
  @ApiProperty({ example: 400 }) statusCode!: number;
  @ApiProperty({ example: 'Bad Request' }) error!: string;
  @ApiProperty({ example: 'Invalid request: email must be an e-mail address' }) message!: string;
  @ApiPropertyOptional({
    type: 'object',
    additionalProperties: { type: 'string' },
    description: 'Reason per failing field (dotted path, array indices in brackets)',
    example: { email: 'email must be an e-mail address' },
  })
  fields?: Record<string, string>;
}
