import { Controller, Get, Post, Put, Query, Res } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import { Caller, type RequestContext } from '../auth/principal.js';
import { Requires } from '../auth/requires.decorator.js';
import { IdParam } from '../common/decorators/uuid-param.js';
import { ListRoute, parseListQuery, setContentRange } from '../common/lists/list-query.js';
import { SchemaBody } from '../common/schemas/schema.pipe.js';
import { type DeviceInput, DevicesService, devicesListSpec } from './devices.service.js';
import { Responds } from '../common/schemas/responds.decorator.js';

@ApiTags('devices')
@Controller('devices')
export class DevicesController {
  constructor(private readonly devices: DevicesService) {}

  @Get()
  @Requires('devices:read')
  @ListRoute(devicesListSpec, 'device.view')
  @ApiOperation({ summary: 'Scales, thermometers, hygrometers, loggers and gateways' })
  async list(@Caller() c: RequestContext, @Query() query: Record<string, unknown>, @Res({ passthrough: true }) reply: FastifyReply) {
    const q = parseListQuery(query, devicesListSpec);
    const { rows, total } = await this.devices.list(c, q);
    setContentRange(reply, devicesListSpec.resource, q, rows.length, total);
    return rows;
  }

  @Get(':id')
  @Requires('devices:read')
  @ApiOperation({ summary: 'One device' })
  @Responds(200, 'device.view')
  get(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.devices.get(c, id);
  }

  @Post()
  @Requires('devices:manage')
  @ApiOperation({ summary: 'Register a device', description: 'Scales need readability (the division d) and capacity, in any mass unit; stored in kg.' })
  @Responds(201, 'device.view')
  create(@Caller() c: RequestContext, @SchemaBody('device.create') body: DeviceInput) {
    return this.devices.create(c, body);
  }

  @Put(':id')
  @Requires('devices:manage')
  @ApiOperation({ summary: 'Change a device (station, calibration due date, readability, retired)' })
  @Responds(200, 'device.view')
  update(@Caller() c: RequestContext, @IdParam() id: string, @SchemaBody('device.update') body: DeviceInput) {
    return this.devices.update(c, id, body);
  }
}
