import { BullModule } from '@nestjs/bull';
import { Module } from '@nestjs/common';
import { workerEnabled } from '../config/process-role.js';
import { JudgeProcessor } from './judge.processor.js';
import { JUDGE_QUEUE } from './readings.constants.js';
import { ReadingsController } from './readings.controller.js';
import { ReadingsRepository } from './readings.repository.js';
import { ReadingsService } from './readings.service.js';

@Module({
  imports: [BullModule.registerQueue({ name: JUDGE_QUEUE })],
  controllers: [ReadingsController],
  providers: [ReadingsRepository, ReadingsService, ...(workerEnabled() ? [JudgeProcessor] : [])],
  exports: [ReadingsService],
})
export class ReadingsModule {}
