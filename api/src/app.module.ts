import { Module, type DynamicModule } from '@nestjs/common';
import { APP_GUARD, Reflector } from '@nestjs/core';
import { ThrottlerGuard, ThrottlerModule } from '@nestjs/throttler';
import type { ExecutionContext } from '@nestjs/common';
import { AuthModule } from './auth/auth.module.js';
import { LOGIN_THROTTLE } from './auth/auth.controller.js';
import { JwtAuthGuard } from './auth/jwt-auth.guard.js';
import { PermissionsGuard } from './auth/permissions.guard.js';
import { ComputeModule } from './compute/compute.module.js';
import type { AppConfig } from './config/app-config.js';
import { AppConfigModule } from './config/config.module.js';
import { DatabaseModule } from './db/database.module.js';
import { EventsModule } from './events/conditions-events.js';
import { HealthController } from './health/health.controller.js';
import { SeedModule } from './seed/seed.module.js';
import { StationsModule } from './stations/stations.module.js';
import { LinksModule } from './links/links.module.js';
import { StudiesModule } from './studies/studies.module.js';
import { ProfilesModule } from './profiles/profiles.module.js';
import { SoundingsModule } from './soundings/soundings.module.js';
import { UsersModule } from './users/users.module.js';
import { NoticesModule } from './notices/notices.module.js';
import { ConditionsModule } from './conditions/conditions.module.js';
import { PlanModule } from './plan/plan.module.js';
import { NetsModule } from './nets/nets.module.js';
import { WatchModule } from './watch/watch.module.js';
import { AuditModule } from './audit/audit.module.js';

const MINUTE_MS = 60_000;
const reflector = new Reflector();
const isLoginRoute = (ctx: ExecutionContext) =>
  reflector.get<boolean>(LOGIN_THROTTLE, ctx.getHandler()) === true;

@Module({})
export class AppModule {
  static forRoot(config: AppConfig): DynamicModule {
    return {
      module: AppModule,
      imports: [
        AppConfigModule.forRoot(config),
        DatabaseModule.forRoot(config.dbFile),
        EventsModule,
        ThrottlerModule.forRoot({
          throttlers: [
            // Per client IP, across all routes.
            { name: 'default', ttl: MINUTE_MS, limit: config.throttleLimitPerMin },
            // Stricter, against password guessing: counts only the login route.
            {
              name: 'login',
              ttl: MINUTE_MS,
              limit: config.loginThrottleLimitPerMin,
              skipIf: (ctx) => !isLoginRoute(ctx),
            },
          ],
        }),
        AuthModule,
        UsersModule,
        ComputeModule,
        ProfilesModule,
        SoundingsModule,
        StationsModule,
        LinksModule,
        StudiesModule,
        NoticesModule,
        ConditionsModule,
        PlanModule,
        NetsModule,
        WatchModule,
        AuditModule,
        SeedModule,
      ],
      controllers: [HealthController],
      providers: [
        // Order matters: throttle first, then sign-in, then permissions (STACK gotcha 4).
        ThrottlerGuard,
        { provide: APP_GUARD, useExisting: ThrottlerGuard },
        { provide: APP_GUARD, useExisting: JwtAuthGuard },
        { provide: APP_GUARD, useExisting: PermissionsGuard },
      ],
    };
  }
}
