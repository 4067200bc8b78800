import { Module } from '@nestjs/common';
import { DrizzleUsersRepository } from './drizzle-users.repository.js';
import { UsersController } from './users.controller.js';
import { UsersRepository } from './users.repository.js';
import { UsersService } from './users.service.js';

@Module({
  controllers: [UsersController],
  providers: [UsersService, { provide: UsersRepository, useClass: DrizzleUsersRepository }],
  exports: [UsersRepository, UsersService],
})
export class UsersModule {}
