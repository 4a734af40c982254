import { Global, Module } from '@nestjs/common';
import { ApiKeysController } from './api-keys.controller.js';
import { ApiKeysService } from './api-keys.service.js';
import { PrincipalCache } from './principal-cache.js';

@Global()
@Module({ controllers: [ApiKeysController], providers: [ApiKeysService, PrincipalCache], exports: [ApiKeysService] })
export class ApiKeysModule {}
