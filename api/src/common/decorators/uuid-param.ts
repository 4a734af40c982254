import { Param, ParseUUIDPipe } from '@nestjs/common';
import { ProblemException } from '../problems.js';

/**
 * An `:id` path parameter that must be a UUID. Anything else cannot name a row, so it answers 404
 * (the same as an id of another organization) instead of reaching the database.
 */
export const IdParam = (name = 'id') =>
  Param(name, new ParseUUIDPipe({ exceptionFactory: () => new ProblemException(404, { detail: `No such ${name}.` }) }));
