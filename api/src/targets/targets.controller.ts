import { Controller, HttpCode, Post, Query } from '@nestjs/common';
import { ApiOperation, ApiQuery, ApiTags } from '@nestjs/swagger';
import { Caller, type RequestContext } from '../auth/principal.js';
import { Requires } from '../auth/requires.decorator.js';
import { SchemaBody } from '../common/schemas/schema.pipe.js';
import { DisplayUnitsService } from '../users/display-units.service.js';
import { type MoldSpec, type OptionsInput, type SystemSpec, TargetsService } from './targets.service.js';
import { Responds } from '../common/schemas/responds.decorator.js';

interface PreviewBody {
  system: SystemSpec;
  mold?: MoldSpec;
  freeRiseCup?: { volume: { value: number; unit: string } };
  options?: OptionsInput;
}

export const UNITS_QUERY = ApiQuery({ name: 'units', required: false, enum: ['metric', 'imperial'], description: "Unit system of the figures (SI is always alongside); the caller's preference when not given" });

@ApiTags('targets')
@Controller('targets')
export class TargetsController {
  constructor(private readonly targets: TargetsService, private readonly displayUnits: DisplayUnitsService) {}

  @Post('preview')
  @HttpCode(200)
  @Requires('targets:read')
  @UNITS_QUERY
  @ApiOperation({
    summary: 'Compute batch targets without storing anything',
    description: 'A system (by id, or inline) and a mold (by id, inline, or a free-rise cup) with options give every figure with its unit and SI alongside, warnings, and the cautions. Nothing is written.',
  })
  @Responds(200, 'targets.view')
  async preview(@Caller() c: RequestContext, @SchemaBody('targets.preview') body: PreviewBody, @Query('units') units?: string) {
    const system = await this.displayUnits.resolve(c, units);
    const resolved = await this.targets.resolve(c.principal.organizationId, {
      system: body.system,
      mold: body.mold,
      freeRiseCup: body.freeRiseCup,
      options: body.options,
      at: { systemId: '/system/id', systemRevision: '/system/revision', systemInline: '/system', moldId: '/mold/id', moldInline: '/mold', freeRiseCup: '/freeRiseCup', options: '/options' },
    });
    return this.targets.view(c, system, resolved);
  }
}
