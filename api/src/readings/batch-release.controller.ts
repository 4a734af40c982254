import { Controller, Get, HttpCode, Post } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import { Caller, type RequestContext } from '../auth/principal.js';
import { Requires } from '../auth/requires.decorator.js';
import { BatchesService } from '../batches/batches.service.js';
import { IdParam } from '../common/decorators/uuid-param.js';
import { Responds } from '../common/schemas/responds.decorator.js';
import { ReviewService } from './review.service.js';

/** Releasing a batch is the end of its review: complete, and every rejection waived. */
@ApiTags('batches')
@Controller('batches')
export class BatchReleaseController {
  constructor(private readonly review: ReviewService, private readonly batches: BatchesService) {}

  @Get(':id/release-check')
  @Requires('shop:read')
  @ApiOperation({ summary: 'What a batch still needs before release', description: 'Every component its targets name (A, B, the pigment when weighed separately) and what its system asks for (milestones, temperatures), each recorded and accepted or waived; and rejections still open.' })
  @Responds(200, 'batch-release-check.view')
  check(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.review.releaseCheck(c, id);
  }

  @Post(':id/release')
  @Requires('readings:review')
  @HttpCode(200)
  @ApiOperation({ summary: 'Release a batch', description: 'When the batch is complete (see release-check) and every rejected reading was waived (or none was rejected); 409 with what is missing otherwise.' })
  @Responds(200, 'batch.view')
  async release(@Caller() c: RequestContext, @IdParam() id: string) {
    await this.review.release(c, id);
    return this.batches.get(c, id);
  }
}
