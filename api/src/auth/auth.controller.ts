import type { LoginResponse, UserView } from '@hopwise/common';
import { Body, Controller, Get, HttpCode, Post, Res, SetMetadata } from '@nestjs/common';
import {
  ApiBearerAuth,
  ApiOkResponse,
  ApiResponse,
  ApiTags,
  ApiTooManyRequestsResponse,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import type { Response } from 'express';
import { ApiErrorDto } from '../http/api-error.dto.js';
import { Public } from '../http/public.decorator.js';
import { UserViewDto } from '../users/dto/user-view.dto.js';
import { AuthService } from './auth.service.js';
import { CurrentUser, type AuthUser } from './auth-user.js';
import { LoginDto, LoginResponseDto } from './dto/login.dto.js';
import { AccountLockedException } from './login-lockout.js';

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
  @ApiResponse({ status: 423, type: ApiErrorDto, description: 'Account locked (Retry-After)' })
  async login(
    @Body() dto: LoginDto,
    @Res({ passthrough: true }) res: Response,
  ): Promise<LoginResponse> {
    try {
      return await this.auth.login(dto.email, dto.password);
    } catch (err) {
      if (err instanceof AccountLockedException) {
        res.setHeader('Retry-After', String(err.retryAfterSeconds));
      }
      throw err;
    }
  }

  /** A fresh token (new expiry) for the holder of a valid one; an expired token gets 401. */
  @Post('refresh')
  @HttpCode(200)
  @ApiBearerAuth()
  @ApiOkResponse({ type: LoginResponseDto })
  @ApiUnauthorizedResponse({ type: ApiErrorDto })
  refresh(@CurrentUser() user: AuthUser): Promise<LoginResponse> {
    return this.auth.refresh(user.id);
  }

  @Get('me')
  @ApiBearerAuth()
  @ApiOkResponse({ type: UserViewDto })
  me(@CurrentUser() user: AuthUser): UserView {
    return user;
  }
}
