import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC = 'pourgate:public';
/** Marks a route that needs no credentials (health, sign-in, the docs). */
export const Public = () => SetMetadata(IS_PUBLIC, true);
