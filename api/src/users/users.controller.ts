import type { ListResponse, UserView } from '@hopwise/common';
import { Body, Controller, Get, Param, ParseIntPipe, Patch, Post, Query } from '@nestjs/common';
import {
  ApiBearerAuth,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import { CurrentUser, type AuthUser } from '../auth/auth-user.js';
import { badRequest } from '../http/api-error.js';
import { ApiErrorDto } from '../http/api-error.dto.js';
import { RequirePermission } from '../http/require-permission.decorator.js';
import { CreateUserDto } from './dto/create-user.dto.js';
import { ListUsersQuery } from './dto/list-users.query.js';
import { UpdateUserDto } from './dto/update-user.dto.js';
import { UserListDto, UserViewDto } from './dto/user-view.dto.js';
import { UsersService } from './users.service.js';

/** `:id` as an integer, else 400 naming `id`. */
function IdParam(): ParameterDecorator {
  return Param(
    'id',
    new ParseIntPipe({
      exceptionFactory: () => badRequest('id must be an integer', { id: 'must be an integer' }),
    }),
  );
}

@ApiTags('users')
@ApiBearerAuth()
@RequirePermission('users:manage')
@Controller('users')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  @ApiOkResponse({ type: UserListDto })
  list(@Query() query: ListUsersQuery): Promise<ListResponse<UserView>> {
    return this.users.list(query.limit, query.offset);
  }

  @Post()
  @ApiCreatedResponse({ type: UserViewDto })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'E-mail already in use' })
  create(@CurrentUser() actor: AuthUser, @Body() dto: CreateUserDto): Promise<UserView> {
    return this.users.create(actor, dto);
  }

  @Patch(':id')
  @ApiOkResponse({ type: UserViewDto })
  @ApiNotFoundResponse({ type: ApiErrorDto })
  @ApiConflictResponse({ type: ApiErrorDto, description: 'Disabling or demoting yourself' })
  update(
    @CurrentUser() actor: AuthUser,
    @IdParam() id: number,
    @Body() dto: UpdateUserDto,
  ): Promise<UserView> {
    return this.users.update(actor, id, dto);
  }
}
