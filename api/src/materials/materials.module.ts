import { Module } from '@nestjs/common';
import { MaterialSystemsController } from './material-systems.controller.js';
import { MaterialSystemsService } from './material-systems.service.js';

@Module({ controllers: [MaterialSystemsController], providers: [MaterialSystemsService], exports: [MaterialSystemsService] })
export class MaterialsModule {}
