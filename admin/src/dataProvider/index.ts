import simpleRestProvider from 'ra-data-simple-rest';
import type { DataProvider } from 'react-admin';
import type { ApiKey, ApiKeyWithSecret, Invitation } from '../types';
import type { HttpClient } from './httpClient';

export interface AcceptInvitationInput {
  token: string;
  name: string;
  password: string;
}

/** ra-data-simple-rest for the lists and forms, plus the few commands that are not CRUD. */
export interface PourgateDataProvider extends DataProvider {
  revokeApiKey(id: string): Promise<{ data: ApiKey }>;
  rotateApiKey(id: string, graceSeconds: number): Promise<{ data: ApiKeyWithSecret }>;
  revokeInvitation(id: string): Promise<{ data: Invitation }>;
  acceptInvitation(input: AcceptInvitationInput): Promise<{ email: string }>;
}

export function createDataProvider(http: HttpClient, apiBase = '/v1'): PourgateDataProvider {
  const rest = simpleRestProvider(apiBase, http.fetchJson);
  const post = (path: string, body: unknown, anonymous = false) =>
    http.fetchJson(`${apiBase}${path}`, { method: 'POST', body: JSON.stringify(body), anonymous });
  return {
    ...rest,
    async revokeApiKey(id) {
      const { json } = await post(`/api-keys/${encodeURIComponent(id)}/revoke`, {});
      return { data: json as ApiKey };
    },
    async rotateApiKey(id, graceSeconds) {
      const { json } = await post(`/api-keys/${encodeURIComponent(id)}/rotate`, { graceSeconds });
      return { data: json as ApiKeyWithSecret };
    },
    async revokeInvitation(id) {
      const { json } = await post(`/invitations/${encodeURIComponent(id)}/revoke`, {});
      return { data: json as Invitation };
    },
    async acceptInvitation(input) {
      const { json } = await post('/invitations/accept', input, true);
      return json as { email: string };
    },
  };
}
