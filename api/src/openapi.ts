import type { INestApplication } from '@nestjs/common';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';

/** OpenAPI document: UI at /api/docs, JSON at /api/docs-json. */
export function setUpOpenApi(app: INestApplication): void {
  const config = new DocumentBuilder()
    .setTitle('Hopwise API')
    .setDescription(
      'HF sky-wave link planning: compute routes (plasma, vertical, oblique, slant, invert), ' +
        'sign-in and user administration. Errors share one shape: ' +
        '`{ statusCode, error, message, fields? }`.',
    )
    .setVersion('0.1.0')
    .addBearerAuth()
    .build();
  const document = SwaggerModule.createDocument(app, config);
  SwaggerModule.setup('api/docs', app, document, { jsonDocumentUrl: 'api/docs-json' });
}
