import { Controller, Get, Header, HttpCode, Patch, Post, Query, Res } from '@nestjs/common';
import { ApiOperation, ApiProduces, ApiQuery, ApiTags } from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import { Caller, type RequestContext } from '../auth/principal.js';
import { Requires } from '../auth/requires.decorator.js';
import { IdParam } from '../common/decorators/uuid-param.js';
import { ListRoute, parseListQuery, setContentRange } from '../common/lists/list-query.js';
import { Responds } from '../common/schemas/responds.decorator.js';
import { SchemaBody } from '../common/schemas/schema.pipe.js';
import { chartsListSpec, signalsListSpec } from './control.repository.js';
import { type BaselineInput, type ChartDataQuery, type ChartInput, type ChartUpdate, ControlService } from './control.service.js';

const PERIOD_QUERY = [
  ApiQuery({ name: 'from', required: false, description: 'ISO 8601 date-time: points at or after', schema: { type: 'string', format: 'date-time' } }),
  ApiQuery({ name: 'to', required: false, description: 'ISO 8601 date-time: points before', schema: { type: 'string', format: 'date-time' } }),
  ApiQuery({ name: 'limit', required: false, description: 'the newest points of the period, 2 to 5000 (default 500)', schema: { type: 'integer' } }),
];
const PeriodQuery = (): MethodDecorator => (target, key, d) => {
  for (const q of PERIOD_QUERY) q(target, key, d);
};

@ApiTags('control')
@Controller('control')
export class ControlController {
  constructor(private readonly control: ControlService) {}

  @Get('catalogue')
  @Requires('control:read')
  @ApiOperation({ summary: 'What a chart can watch (metric, unit, chart kinds) and the run rules it can use, with their sources' })
  @Responds(200, 'control-catalogue.view')
  catalogue() {
    return this.control.catalogue();
  }

  @Get('charts')
  @Requires('control:read')
  @ListRoute(chartsListSpec, 'control-chart.view')
  @ApiOperation({ summary: 'Control charts: a metric of a material system, optionally of one station, device or lot' })
  async listCharts(@Caller() c: RequestContext, @Query() query: Record<string, unknown>, @Res({ passthrough: true }) reply: FastifyReply) {
    const q = parseListQuery(query, chartsListSpec);
    const { rows, total } = await this.control.listCharts(c, q);
    setContentRange(reply, chartsListSpec.resource, q, rows.length, total);
    return rows;
  }

  @Post('charts')
  @Requires('control:manage')
  @ApiOperation({ summary: 'Define a control chart and the run rules it watches', description: 'Limits are trial until a baseline is frozen; signals are raised against frozen limits only.' })
  @Responds(201, 'control-chart.view')
  createChart(@Caller() c: RequestContext, @SchemaBody('control-chart.create') body: ChartInput) {
    return this.control.createChart(c, body);
  }

  @Get('charts/:id')
  @Requires('control:read')
  @ApiOperation({ summary: 'One control chart with its baseline' })
  @Responds(200, 'control-chart.view')
  getChart(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.control.getChart(c, id);
  }

  @Patch('charts/:id')
  @Requires('control:manage')
  @ApiOperation({ summary: 'Rename a chart or change its run rules' })
  @Responds(200, 'control-chart.view')
  updateChart(@Caller() c: RequestContext, @IdParam() id: string, @SchemaBody('control-chart.update') body: ChartUpdate) {
    return this.control.updateChart(c, id, body);
  }

  @Post('charts/:id/baseline')
  @Requires('control:manage')
  @HttpCode(200)
  @ApiOperation({ summary: 'Freeze the limits from the first N points or from a period', description: 'Fewer points than the chart’s rules need is a 422 and nothing changes.' })
  @Responds(200, 'control-chart.view')
  freeze(@Caller() c: RequestContext, @IdParam() id: string, @SchemaBody('control-chart.baseline') body: BaselineInput) {
    return this.control.freezeBaseline(c, id, body);
  }

  @Get('charts/:id/data')
  @Requires('control:read')
  @PeriodQuery()
  @ApiOperation({ summary: 'The chart: points with moving ranges, centre line, limits, zones, signals and capability (computed in PostgreSQL)' })
  @Responds(200, 'control-chart-data.view')
  data(@Caller() c: RequestContext, @IdParam() id: string, @Query() q: ChartDataQuery) {
    return this.control.chartData(c, id, q);
  }

  @Get('charts/:id/data.csv')
  @Requires('control:read')
  @PeriodQuery()
  @ApiProduces('text/csv')
  @Header('content-type', 'text/csv; charset=utf-8')
  @ApiOperation({ summary: 'The chart’s points as CSV' })
  @Responds(200, 'control-chart-data.view', { mediaType: 'text/csv', description: 'One row per point: at, value, moving_range, centre, lcl, ucl, limits, signals, reading_id, batch_id' })
  async csv(@Caller() c: RequestContext, @IdParam() id: string, @Query() q: ChartDataQuery, @Res({ passthrough: true }) reply: FastifyReply) {
    const body = await this.control.chartCsv(c, id, q);
    reply.header('content-disposition', `attachment; filename="control-chart-${id}.csv"`);
    return body;
  }

  @Get('signals')
  @Requires('control:read')
  @ListRoute(signalsListSpec, 'control-signal.view')
  @ApiOperation({ summary: 'Run-rule signals (filter acknowledged=false for the open ones)' })
  async listSignals(@Caller() c: RequestContext, @Query() query: Record<string, unknown>, @Res({ passthrough: true }) reply: FastifyReply) {
    const q = parseListQuery(query, signalsListSpec);
    const { rows, total } = await this.control.listSignals(c, q);
    setContentRange(reply, signalsListSpec.resource, q, rows.length, total);
    return rows;
  }

  @Get('signals/:id')
  @Requires('control:read')
  @ApiOperation({ summary: 'One signal with the points of its pattern' })
  @Responds(200, 'control-signal.view')
  getSignal(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.control.getSignal(c, id);
  }

  @Post('signals/:id/acknowledge')
  @Requires('control:manage')
  @HttpCode(200)
  @ApiOperation({ summary: 'Acknowledge a signal with a note saying what was found' })
  @Responds(200, 'control-signal.view')
  acknowledge(@Caller() c: RequestContext, @IdParam() id: string, @SchemaBody('control-signal.acknowledge') body: { note: string }) {
    return this.control.acknowledge(c, id, body);
  }
}
