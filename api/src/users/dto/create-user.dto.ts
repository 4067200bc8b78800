import { ROLES, type Role } from '@hopwise/common';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsEmail, IsIn, IsOptional, IsString, Length, MaxLength, MinLength } from 'class-validator';
import { MIN_PASSWORD_LENGTH } from '../../auth/password.js';

const trim = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);

export class CreateUserDto {
  @ApiProperty({ example: 'new.operator@hopwise.test' })
  @Transform(trim)
  @MaxLength(254)
  @IsEmail({}, { message: 'email must be an e-mail address' })
  email!: string;

  @ApiPropertyOptional({ example: 'Night shift operator', maxLength: 80 })
  @IsOptional()
  @Transform(trim)
  @Length(1, 80)
  @IsString()
  displayName?: string;

  @ApiProperty({ minLength: MIN_PASSWORD_LENGTH, maxLength: 200 })
  @MaxLength(200)
  @MinLength(MIN_PASSWORD_LENGTH, {
    message: `password must be at least ${MIN_PASSWORD_LENGTH} characters long`,
  })
  @IsString()
  password!: string;

  @ApiProperty({ enum: ROLES })
  @IsIn(ROLES, { message: `role must be one of: ${ROLES.join(', ')}` })
  role!: Role;
}
