import { ROLES, type Role, type UserView } from '@hopwise/common';
import { ApiProperty } from '@nestjs/swagger';

export class UserViewDto implements UserView {
  @ApiProperty({ example: 7 }) id!: number;
  @ApiProperty({ example: 'operator@hopwise.test' }) email!: string;
  @ApiProperty({ example: 'Radio Room 2' }) displayName!: string;
  @ApiProperty({ enum: ROLES }) role!: Role;
  @ApiProperty() disabled!: boolean;
  @ApiProperty({ description: 'ISO 8601 UTC', example: '2025-01-31T12:00:00.000Z' })
  createdAt!: string;
}

export class UserListDto {
  @ApiProperty({ type: [UserViewDto] }) items!: UserViewDto[];
  @ApiProperty({ description: 'Number of users in total (not just this page)' }) total!: number;
}
