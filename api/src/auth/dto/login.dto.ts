import { ROLES, type LoginResponse, type Role } from '@hopwise/common';
import { ApiProperty } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsEmail, IsString, MaxLength, MinLength } from 'class-validator';

export class LoginDto {
  @ApiProperty({ example: 'operator@hopwise.test' })
  @Transform(({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value))
  @MaxLength(254)
  @IsEmail({}, { message: 'email must be an e-mail address' })
  email!: string;

  @ApiProperty({ example: 'hopwise-demo' })
  @MaxLength(200)
  @MinLength(1, { message: 'password must not be empty' })
  @IsString()
  password!: string;
}

class LoginUserDto {
  @ApiProperty() id!: number;
  @ApiProperty() email!: string;
  @ApiProperty({ enum: ROLES }) role!: Role;
  @ApiProperty() displayName!: string;
}

export class LoginResponseDto implements LoginResponse {
  @ApiProperty({ description: 'JWT; send as `Authorization: Bearer <token>`' })
  accessToken!: string;
  @ApiProperty({ type: LoginUserDto }) user!: LoginUserDto;
}
