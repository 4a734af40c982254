import { Global, Module } from '@nestjs/common';
import { InvitationsController, UsersController } from './users.controller.js';
import { PublicUrlCheck } from './public-url.check.js';
import { UsersRepository } from './users.repository.js';
import { UsersService } from './users.service.js';

@Global()
@Module({ controllers: [UsersController, InvitationsController], providers: [UsersRepository, UsersService, PublicUrlCheck], exports: [UsersRepository, UsersService] })
export class UsersModule {}
