import { applyDecorators, SetMetadata } from '@nestjs/common';
import { ApiExtension, ApiForbiddenResponse, ApiSecurity, ApiUnauthorizedResponse } from '@nestjs/swagger';
import { Action, ACTIONS, ActionRule } from '@pourgate/permissions';

export const REQUIRED_ACTION = 'pourgate:action';

/**
 * The action a route performs, from the role × action matrix. The guard allows people whose role
 * has it and, where the action names a scope, API keys holding that scope. The OpenAPI document
 * carries it as `x-pourgate-action` so the route-matrix test can check every route.
 */
export function Requires(action: Action) {
  const rule = ACTIONS[action] as ActionRule;
  return applyDecorators(
    SetMetadata(REQUIRED_ACTION, action),
    ApiExtension('x-pourgate-action', action),
    ApiSecurity('person'),
    ...(rule.scope ? [ApiSecurity('apiKey')] : []),
    ApiUnauthorizedResponse({ description: 'No valid credentials' }),
    ApiForbiddenResponse({ description: `Needs the action ${action} (roles: ${rule.roles.join(', ')}${rule.scope ? `; key scope ${rule.scope}` : ''})` }),
  );
}
