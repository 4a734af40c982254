import { Global, Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { APP_GUARD } from '@nestjs/core';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import type { Env } from '../config/env.js';
import { AuthController } from './auth.controller.js';
import { AuthGuard } from './auth.guard.js';
import { JwtStrategy } from './strategies.js';
import { TokensService } from './tokens.service.js';

@Global()
@Module({
  imports: [
    PassportModule,
    JwtModule.registerAsync({ inject: [ConfigService], useFactory: (config: ConfigService<Env, true>) => ({ secret: config.get('JWT_SECRET', { infer: true }) }) }),
  ],
  controllers: [AuthController],
  providers: [TokensService, JwtStrategy, { provide: APP_GUARD, useClass: AuthGuard }],
  exports: [TokensService],
})
export class AuthModule {}
