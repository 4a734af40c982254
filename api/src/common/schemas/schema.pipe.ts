import { ArgumentMetadata, Body, Injectable, PipeTransform, Query } from '@nestjs/common';
import { ApiBody, ApiQuery } from '@nestjs/swagger';
import { malformed, validationProblem } from '../problems.js';
import { schemaRegistry } from './schema-registry.js';

/** Validates a body or query against a schema from `schemas/`; 422 (body) or 400 (query) with pointers. */
@Injectable()
export class SchemaPipe implements PipeTransform {
  constructor(private readonly schema: string, private readonly kind: 'body' | 'query') {
    schemaRegistry().get(schema);
  }

  transform(value: unknown, _meta: ArgumentMetadata): unknown {
    if (this.kind === 'body' && (value === undefined || value === null)) {
      throw validationProblem([{ pointer: '/', detail: 'a JSON body is required', code: 'required' }], 'The request needs a JSON body.');
    }
    const target = this.kind === 'query' ? { ...(value as object) } : value;
    const errors = schemaRegistry().validate(this.schema, target, this.kind);
    if (errors.length === 0) return target;
    if (this.kind === 'query') throw malformed('Some query parameters are not valid.', errors);
    throw validationProblem(errors);
  }
}

/** `@SchemaBody('x')`: the body validated by schemas/x.schema.json, and documented with it. */
export function SchemaBody(name: string): ParameterDecorator {
  return (target, key, index) => {
    Body(new SchemaPipe(name, 'body'))(target, key, index);
    const descriptor = Object.getOwnPropertyDescriptor(target, key!)!;
    ApiBody({ schema: { $ref: `#/components/schemas/${name}` } })(target, key!, descriptor);
  };
}

/** `@SchemaQuery('x')`: the query string validated (and coerced) by schemas/x.schema.json. */
export function SchemaQuery(name: string): ParameterDecorator {
  return (target, key, index) => {
    Query(new SchemaPipe(name, 'query'))(target, key, index);
    const descriptor = Object.getOwnPropertyDescriptor(target, key!)!;
    const schema = schemaRegistry().get(name) as { properties?: Record<string, object>; required?: string[] };
    for (const [prop, propSchema] of Object.entries(schema.properties ?? {})) {
      ApiQuery({ name: prop, required: schema.required?.includes(prop) ?? false, schema: propSchema })(target, key!, descriptor);
    }
  };
}
