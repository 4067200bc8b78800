import type { LoginResponse, UserView } from '@hopwise/common';
import { Body, Controller, Get, HttpCode, Post, SetMetadata } from '@nestjs/common';
import {
  ApiBearerAuth,
  ApiOkResponse,
  ApiTags,
  ApiTooManyRequestsResponse,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import { ApiErrorDto } from '../http/api-error.dto.js';
import { Public } from '../http/public.decorator.js';
import { UserViewDto } from '../users/dto/user-view.dto.js';
import { AuthService } from './auth.service.js';
import { CurrentUser, type AuthUser } from './auth-user.js';
import { LoginDto, LoginResponseDto } from './dto/login.dto.js';

/** Marks the route counted by the stricter `login` throttler (see app.module.ts). */
export const LOGIN_THROTTLE = 'hopwise:loginThrottle';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(private readonly auth: AuthService) {}

  @Public()
  @Post('login')
  @HttpCode(200)
  @SetMetadata(LOGIN_THROTTLE, true)
  @ApiOkResponse({ type: LoginResponseDto })
  @ApiUnauthorizedResponse({ type: ApiErrorDto, description: 'Invalid email or password' })
  @ApiTooManyRequestsResponse({ type: ApiErrorDto })
  login(@Body() dto: LoginDto): Promise<LoginResponse> {
    return this.auth.login(dto.email, dto.password);
  }

  @Get('me')
  @ApiBearerAuth()
  @ApiOkResponse({ type: UserViewDto })
  me(@CurrentUser() user: AuthUser): UserView {
    return user;
  }
}
