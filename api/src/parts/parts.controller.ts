import { Controller, Get, Header, HttpCode, Post, Put, Query, Res } from '@nestjs/common';
import { ApiOperation, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import { Caller, type RequestContext } from '../auth/principal.js';
import { Requires } from '../auth/requires.decorator.js';
import { IdParam } from '../common/decorators/uuid-param.js';
import { ListRoute, parseListQuery, setContentRange } from '../common/lists/list-query.js';
import { Responds } from '../common/schemas/responds.decorator.js';
import { SchemaBody, SchemaQuery } from '../common/schemas/schema.pipe.js';
import { type DefectCauseInput, DefectCausesService } from './defect-causes.service.js';
import { defectCausesListSpec, partsListSpec } from './parts.repository.js';
import { type DispositionInput, type PartInput, PartsService, type SpecimenInput } from './parts.service.js';
import { type ParetoQuery, ProductionService } from './production.service.js';

@ApiTags('parts')
@Controller('parts')
export class PartsController {
  constructor(private readonly parts: PartsService) {}

  @Get()
  @Requires('shop:read')
  @ListRoute(partsListSpec, 'part.view')
  @ApiOperation({ summary: 'Demolded parts with their molded density, specimens and disposition (filter batchId, workOrderId, disposition)' })
  async list(@Caller() c: RequestContext, @Query() query: Record<string, unknown>, @Res({ passthrough: true }) reply: FastifyReply) {
    const q = parseListQuery(query, partsListSpec);
    const { rows, total } = await this.parts.list(c, q);
    setContentRange(reply, partsListSpec.resource, q, rows.length, total);
    return rows;
  }

  @Get(':id')
  @Requires('shop:read')
  @ApiOperation({ summary: 'One part' })
  @Responds(200, 'part.view')
  get(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.parts.get(c, id);
  }

  @Post(':id/specimens')
  @Requires('parts:write')
  @ApiOperation({
    summary: 'Record a test specimen of a part',
    description: 'core_density: mass ÷ volume of the specimen (ASTM D3574 Test A / ISO 845); indentation_force: force at 25 % deflection (ASTM D3574 Test B1); durometer (ASTM D2240). Judged against the system’s spec. Answers the part.',
  })
  @Responds(201, 'part.view')
  specimen(@Caller() c: RequestContext, @IdParam() id: string, @SchemaBody('specimen.create') body: SpecimenInput) {
    return this.parts.addSpecimen(c, id, body);
  }
}

@ApiTags('parts')
@Controller('batches')
export class BatchPartsController {
  constructor(private readonly parts: PartsService, private readonly production: ProductionService) {}

  @Post(':id/parts')
  @Requires('parts:write')
  @ApiOperation({
    summary: 'Record a demolded part of a batch',
    description: 'Molded density = mass ÷ cavity volume (as stored with the batch), judged against the batch’s target density ± the system’s part tolerance (10 % when it states none). A device key records on its own scale.',
  })
  @Responds(201, 'part.view')
  record(@Caller() c: RequestContext, @IdParam() id: string, @SchemaBody('part.create') body: PartInput) {
    return this.parts.record(c, id, body);
  }

  @Post(':id/disposition')
  @Requires('parts:dispose')
  @ApiOperation({ summary: 'Dispose of a batch’s parts: accepted, rework or scrap, with defect causes', description: 'Once per batch (a second is a 409). Emits batch.disposed.' })
  @Responds(201, 'batch-disposition.view')
  dispose(@Caller() c: RequestContext, @IdParam() id: string, @SchemaBody('batch-disposition.create') body: DispositionInput) {
    return this.parts.dispose(c, id, body);
  }

  @Get(':id/disposition')
  @Requires('shop:read')
  @ApiOperation({ summary: 'A batch’s disposition (404 until it has one)' })
  @Responds(200, 'batch-disposition.view')
  disposition(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.parts.disposition(c, id);
  }

  @Get(':id/genealogy')
  @Requires('shop:read')
  @ApiOperation({ summary: 'What went into a batch (its lots) and what came out (its parts and disposition)' })
  @Responds(200, 'batch-genealogy.view')
  genealogy(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.production.batchGenealogy(c, id);
  }
}

@ApiTags('parts')
@Controller('defect-causes')
export class DefectCausesController {
  constructor(private readonly causes: DefectCausesService) {}

  @Get()
  @Requires('shop:read')
  @ListRoute(defectCausesListSpec, 'defect-cause.view')
  @ApiOperation({ summary: 'The organization’s defect causes (seeded with trade terms: voids, short fill, skin defects, splits, shrinkage, tack, ...)' })
  async list(@Caller() c: RequestContext, @Query() query: Record<string, unknown>, @Res({ passthrough: true }) reply: FastifyReply) {
    const q = parseListQuery(query, defectCausesListSpec);
    const { rows, total } = await this.causes.list(c, q);
    setContentRange(reply, defectCausesListSpec.resource, q, rows.length, total);
    return rows;
  }

  @Get(':id')
  @Requires('shop:read')
  @ApiOperation({ summary: 'One defect cause' })
  @Responds(200, 'defect-cause.view')
  get(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.causes.get(c, id);
  }

  @Post()
  @Requires('defect-causes:manage')
  @ApiOperation({ summary: 'Add a defect cause' })
  @Responds(201, 'defect-cause.view')
  create(@Caller() c: RequestContext, @SchemaBody('defect-cause.create') body: DefectCauseInput) {
    return this.causes.create(c, body);
  }

  @Put(':id')
  @Requires('defect-causes:manage')
  @ApiOperation({ summary: 'Rename, describe or retire a defect cause (its code stays)' })
  @Responds(200, 'defect-cause.view')
  update(@Caller() c: RequestContext, @IdParam() id: string, @SchemaBody('defect-cause.update') body: DefectCauseInput) {
    return this.causes.update(c, id, body);
  }
}

@ApiTags('parts')
@Controller('work-orders')
export class WorkOrderProductionController {
  constructor(private readonly production: ProductionService) {}

  @Get(':id/batch-plan')
  @Requires('shop:read')
  @ApiOperation({ summary: 'The batches a work order still needs: ceil(parts remaining ÷ mold cavities), with a body for POST /v1/batches each' })
  @Responds(200, 'batch-plan.view')
  plan(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.production.batchPlan(c, id);
  }

  @Get(':id/consumption')
  @Requires('shop:read')
  @ApiOperation({ summary: 'Consumption and yield: planned vs actual mass of A, B and pigment by lot, parts good/rework/scrap, scrap mass', description: '409 while the work order has no batch.' })
  @Responds(200, 'consumption.view')
  consumption(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.production.consumption(c, id);
  }

  @Get(':id/consumption.csv')
  @Requires('shop:read')
  @ApiProduces('text/csv')
  @Header('content-type', 'text/csv; charset=utf-8')
  @ApiOperation({ summary: 'Consumption and yield as CSV (one row per material and lot; the JSON form is GET /v1/work-orders/{id}/consumption)' })
  @Responds(200, 'consumption.view', { mediaType: 'text/csv', description: 'work_order, part_number, ordered, batches, parts_accepted, parts_rework, parts_scrap, parts_undecided, yield, scrap_mass_kg, material, lot, lot_batches, planned_kg, actual_kg, variance_kg' })
  async consumptionCsv(@Caller() c: RequestContext, @IdParam() id: string, @Res({ passthrough: true }) reply: FastifyReply) {
    const body = await this.production.consumptionCsv(c, id);
    reply.header('content-disposition', `attachment; filename="consumption-${id}.csv"`);
    return body;
  }

  @Post(':id/complete')
  @Requires('parts:dispose')
  @HttpCode(200)
  @ApiOperation({ summary: 'Complete a work order: state done, and work_order.completed carries its consumption for the ERP to back-flush stock', description: '409 when it has no batch or is done or cancelled already.' })
  @Responds(200, 'consumption.view')
  complete(@Caller() c: RequestContext, @IdParam() id: string, @SchemaBody('work-order.complete') body: { note?: string | null }) {
    return this.production.complete(c, id, body.note ?? null);
  }
}

@ApiTags('parts')
@Controller('lots')
export class LotTraceController {
  constructor(private readonly production: ProductionService) {}

  @Get(':id/genealogy')
  @Requires('shop:read')
  @ApiOperation({ summary: 'Where a lot went: its batches (with their other lots), work orders and parts' })
  @Responds(200, 'lot-genealogy.view')
  genealogy(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.production.lotGenealogy(c, id);
  }

  @Get(':id/recall')
  @Requires('shop:read')
  @ApiOperation({ summary: 'The recall report of a lot: every batch it went into, its part count, work order and disposition' })
  @Responds(200, 'recall.view')
  report(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.production.recallReport(c, id);
  }

  @Get(':id/recall.csv')
  @Requires('shop:read')
  @ApiProduces('text/csv')
  @Header('content-type', 'text/csv; charset=utf-8')
  @ApiOperation({ summary: 'The recall report as CSV (the JSON form is GET /v1/lots/{id}/recall)' })
  @Responds(200, 'recall.view', { mediaType: 'text/csv', description: 'lot, part, batch, planned_for, state, work_order, part_number, mold, station, part_count, disposition, accepted, rework, scrap, undecided' })
  async reportCsv(@Caller() c: RequestContext, @IdParam() id: string, @Res({ passthrough: true }) reply: FastifyReply) {
    const body = await this.production.recallCsv(c, id);
    reply.header('content-disposition', `attachment; filename="recall-${id}.csv"`);
    return body;
  }

  @Post(':id/recall')
  @Requires('lots:recall')
  @HttpCode(200)
  @ApiOperation({ summary: 'Recall a lot: it goes into no new batch (without an override), and lot.recalled tells the ERP', description: '409 when already recalled. Answers the recall report.' })
  @Responds(200, 'recall.view')
  recall(@Caller() c: RequestContext, @IdParam() id: string, @SchemaBody('lot.recall') body: { reason: string }) {
    return this.production.recall(c, id, body.reason);
  }
}

@ApiTags('parts')
@Controller('defects')
export class DefectsController {
  constructor(private readonly production: ProductionService) {}

  @Get('pareto')
  @Requires('shop:read')
  @ApiOperation({ summary: 'A Pareto of defect causes over a period, per system, mold or station', description: 'Largest first with the running share; computed by the API.' })
  @Responds(200, 'pareto.view')
  pareto(@Caller() c: RequestContext, @SchemaQuery('pareto.query') q: ParetoQuery) {
    return this.production.pareto(c, q);
  }
}
