import { ApiProperty } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsObject, IsString, IsUrl, Matches, MaxLength, ValidateNested } from 'class-validator';

// Base64url without padding (RFC 4648 §5), as PushSubscription.toJSON() gives the keys.
const BASE64URL = /^[A-Za-z0-9_-]+={0,2}$/;

export class PushKeysDto {
  @ApiProperty({ description: "Browser's P-256 ECDH public key, base64url (65 bytes raw)" })
  @IsString()
  @MaxLength(200)
  @Matches(BASE64URL, { message: 'keys.p256dh must be base64url' })
  p256dh!: string;

  @ApiProperty({ description: 'Authentication secret, base64url (16 bytes)' })
  @IsString()
  @MaxLength(100)
  @Matches(BASE64URL, { message: 'keys.auth must be base64url' })
  auth!: string;
}

export class EndpointDto {
  @ApiProperty({ example: 'https://push.example.net/send/abc123' })
  @IsUrl(
    {
      protocols: ['https'],
      require_protocol: true,
      require_tld: false,
      require_valid_protocol: true,
    },
    { message: 'endpoint must be an https URL' },
  )
  @MaxLength(1000)
  endpoint!: string;
}

export class PushSubscriptionDto extends EndpointDto {
  @ApiProperty({ type: PushKeysDto })
  @IsObject({ message: 'keys must be an object { p256dh, auth }' })
  @ValidateNested()
  @Type(() => PushKeysDto)
  keys!: PushKeysDto;
}
