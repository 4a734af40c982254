import { Controller, Get, HttpCode, Post, Put, Query, Res } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import type { Role } from '@pourgate/permissions';
import { Caller, Origin, type RequestContext } from '../auth/principal.js';
import { NoStore } from '../common/decorators/no-store.decorator.js';
import { Requires } from '../auth/requires.decorator.js';
import { Public } from '../common/decorators/public.decorator.js';
import { IdParam } from '../common/decorators/uuid-param.js';
import { ListRoute, parseListQuery, setContentRange } from '../common/lists/list-query.js';
import { SchemaBody } from '../common/schemas/schema.pipe.js';
import { invitationsListSpec, UsersService, usersListSpec } from './users.service.js';
import { Responds } from '../common/schemas/responds.decorator.js';

@ApiTags('people')
@Controller('users')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  @Requires('people:read')
  @ListRoute(usersListSpec, 'user.view')
  @ApiOperation({ summary: 'People of the organization' })
  async list(@Caller() c: RequestContext, @Query() query: Record<string, unknown>, @Res({ passthrough: true }) reply: FastifyReply) {
    const q = parseListQuery(query, usersListSpec);
    const { rows, total } = await this.users.list(c, q);
    setContentRange(reply, usersListSpec.resource, q, rows.length, total);
    return rows;
  }

  @Get(':id')
  @Requires('people:read')
  @ApiOperation({ summary: 'One person' })
  @Responds(200, 'user.view')
  get(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.users.get(c, id);
  }

  @Put(':id')
  @Requires('people:manage')
  @ApiOperation({ summary: 'Change a person’s name, role or disabled state', description: 'Disabling ends the person’s sessions. The last active admin cannot be demoted or disabled (409).' })
  @Responds(200, 'user.view')
  update(@Caller() c: RequestContext, @IdParam() id: string, @SchemaBody('user.update') body: { name?: string; role?: Role; disabled?: boolean }) {
    return this.users.update(c, id, body);
  }
}

@ApiTags('people')
@Controller('invitations')
export class InvitationsController {
  constructor(private readonly users: UsersService) {}

  @Get()
  @Requires('people:read')
  @ListRoute(invitationsListSpec, 'invitation.view')
  @ApiOperation({ summary: 'Invitations sent' })
  async list(@Caller() c: RequestContext, @Query() query: Record<string, unknown>, @Res({ passthrough: true }) reply: FastifyReply) {
    const q = parseListQuery(query, invitationsListSpec);
    const { rows, total } = await this.users.listInvitations(c, q);
    setContentRange(reply, invitationsListSpec.resource, q, rows.length, total);
    return rows;
  }

  @Get(':id')
  @Requires('people:read')
  @ApiOperation({ summary: 'One invitation' })
  @Responds(200, 'invitation.view')
  get(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.users.getInvitation(c, id);
  }

  @Post()
  @Requires('people:manage')
  @ApiOperation({ summary: 'Invite a person by e-mail', description: 'The e-mail carries a one-time link that expires (INVITATION_TTL_HOURS). Inviting the same address again revokes the earlier link.' })
  @Responds(201, 'invitation.view')
  invite(@Caller() c: RequestContext, @SchemaBody('invitation.create') body: { email: string; role: Role; name?: string }) {
    return this.users.invite(c, body);
  }

  @Post(':id/revoke')
  @HttpCode(200)
  @Requires('people:manage')
  @ApiOperation({ summary: 'Revoke a pending invitation' })
  @Responds(200, 'invitation.view')
  revoke(@Caller() c: RequestContext, @IdParam() id: string) {
    return this.users.revokeInvitation(c, id);
  }

  @Post('lookup')
  @Public()
  @HttpCode(200)
  @ApiOperation({ summary: 'What an invitation link offers', description: 'The shop, the role, the invited address and the name the admin typed, for the acceptance page. The token goes in the body (never in a URL, so it stays out of logs); a used, revoked or expired link answers 410.' })
  @Responds(200, 'invitation.preview')
  lookup(@SchemaBody('invitation.lookup') body: { token: string }) {
    return this.users.lookupInvitation(body.token);
  }

  @Post('accept')
  @Public()
  @HttpCode(200)
  @NoStore()
  @ApiOperation({ summary: 'Accept an invitation: set name and password', description: 'Works once; a used, revoked or expired link answers 410. The answer carries a session: the person is signed in.' })
  @Responds(200, 'invitation.accepted')
  accept(@SchemaBody('invitation.accept') body: { token: string; name: string; password: string }, @Origin() origin: { ip: string; userAgent?: string }) {
    return this.users.acceptInvitation(body, origin);
  }
}
