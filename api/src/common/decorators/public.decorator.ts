import { applyDecorators, SetMetadata } from '@nestjs/common';
import { ApiExtension } from '@nestjs/swagger';

export const IS_PUBLIC = 'pourgate:public';
/** Marks a route (or a controller) that needs no credentials: health, sign-in, invitations. */
export const Public = () => applyDecorators(SetMetadata(IS_PUBLIC, true), ApiExtension('x-pourgate-public', true));
