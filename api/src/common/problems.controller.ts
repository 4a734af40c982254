import { Controller, Get, NotFoundException, Param } from '@nestjs/common';
import { ApiExcludeController } from '@nestjs/swagger';
import { Public } from './decorators/public.decorator.js';
import { PROBLEM_TYPES, ProblemSlug } from './problems.js';

/** Serves a description for each problem `type` URI the API emits (`/v1/problems/{slug}`). */
@ApiExcludeController()
@Public()
@Controller({ path: 'problems' })
export class ProblemsController {
  @Get()
  list() {
    return Object.entries(PROBLEM_TYPES).map(([slug, p]) => ({ type: `/v1/problems/${slug}`, ...p }));
  }

  @Get(':slug')
  one(@Param('slug') slug: string) {
    // own properties only: "__proto__" or "constructor" are not problem types
    const p = Object.hasOwn(PROBLEM_TYPES, slug) ? PROBLEM_TYPES[slug as ProblemSlug] : undefined;
    if (!p) throw new NotFoundException(`No problem type "${slug}".`);
    return { type: `/v1/problems/${slug}`, ...p };
  }
}
