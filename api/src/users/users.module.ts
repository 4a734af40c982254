import { Global, Module } from '@nestjs/common';
import { AccountsService } from './accounts.service.js';
import { DisplayUnitsService } from './display-units.service.js';
import { InvitationsController, UsersController } from './users.controller.js';
import { PublicUrlCheck } from './public-url.check.js';
import { UsersRepository } from './users.repository.js';
import { UsersService } from './users.service.js';

@Global()
@Module({
  controllers: [UsersController, InvitationsController],
  providers: [UsersRepository, UsersService, PublicUrlCheck, DisplayUnitsService, AccountsService],
  exports: [UsersService, DisplayUnitsService, AccountsService],
})
export class UsersModule {}
