import simpleRestProvider from 'ra-data-simple-rest';
import type { DataProvider } from 'react-admin';
import type { HttpClient } from './httpClient';
import { writeBody } from './writeBodies';
import type {
  ApiKey,
  ApiKeyWithSecret,
  DeliveryDetail,
  EndpointTestResult,
  Invitation,
  InvitationAccepted,
  InvitationPreview,
  MaterialSystemDocument,
  MaterialSystemRevision,
  Overview,
  OverviewQuery,
  Profile,
  ProfileUpdate,
  WebhookDelivery,
  WebhookEndpointWithSecret,
} from '../views/sdk';

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
  acceptInvitation(input: AcceptInvitationInput): Promise<InvitationAccepted>;
  /** What an invitation link offers (shop, role, address, the name the admin typed), before accepting. */
  lookupInvitation(token: string): Promise<InvitationPreview>;
  materialSystemRevisions(id: string): Promise<{ data: MaterialSystemRevision[]; total: number }>;
  materialSystemDocuments(id: string): Promise<{ data: MaterialSystemDocument[] }>;
  testWebhookEndpoint(id: string): Promise<{ data: EndpointTestResult }>;
  rotateWebhookSecret(id: string, overlapSeconds: number): Promise<{ data: WebhookEndpointWithSecret }>;
  replayWebhookDelivery(id: string): Promise<{ data: DeliveryDetail }>;
  /** The shop floor's figures, counted by the API (`GET /v1/overview`). */
  getOverview(query: OverviewQuery): Promise<{ data: Overview }>;
  /** The signed-in person as `GET /v1/me` has them now (the session's copy may be older). */
  getProfile(): Promise<{ data: Profile }>;
  updateProfile(patch: ProfileUpdate): Promise<{ data: Profile }>;
  /** Uploads an SDS or TDS PDF for a material system (multipart). */
  uploadMaterialSystemDocument(id: string, input: { kind: 'SDS' | 'TDS'; title?: string; file: File }): Promise<{ data: MaterialSystemDocument }>;
  /** A document's content (an SDS or TDS PDF), fetched with the session's token. */
  downloadDocument(href: string): Promise<Blob>;
}

export type { WebhookDelivery };

export function createDataProvider(http: HttpClient, apiBase = '/v1'): PourgateDataProvider {
  const rest = simpleRestProvider(apiBase, http.fetchJson);
  const post = (path: string, body: unknown, anonymous = false) =>
    http.fetchJson(`${apiBase}${path}`, { method: 'POST', body: JSON.stringify(body), anonymous });
  const get = (path: string) => http.fetchJson(`${apiBase}${path}`);
  const id = (v: string) => encodeURIComponent(v);
  return {
    ...rest,
    // the API's schemas are strict: send each resource only the fields it allows
    // a list with more rows than the API counts answers Content-Range …/*: page forward without a total
    async getList(resource, params) {
      const page = await rest.getList(resource, params);
      if (Number.isFinite(page.total)) return page;
      const { page: n = 1, perPage = 25 } = params.pagination ?? {};
      return { data: page.data, pageInfo: { hasPreviousPage: n > 1, hasNextPage: page.data.length >= perPage } };
    },
    create: (resource, params) => rest.create(resource, { ...params, data: writeBody(resource, 'create', params.data) as typeof params.data }),
    update: (resource, params) => rest.update(resource, { ...params, data: writeBody(resource, 'update', params.data) as typeof params.data }),
    async materialSystemRevisions(systemId) {
      const { json, headers } = await get(`/material-systems/${id(systemId)}/revisions?range=${encodeURIComponent('[0,99]')}`);
      const total = Number(headers.get('content-range')?.split('/').pop() ?? (json as unknown[]).length);
      return { data: json as MaterialSystemRevision[], total };
    },
    async materialSystemDocuments(systemId) {
      const { json } = await get(`/material-systems/${id(systemId)}/documents`);
      return { data: json as MaterialSystemDocument[] };
    },
    async testWebhookEndpoint(endpointId) {
      const { json } = await post(`/webhook-endpoints/${id(endpointId)}/test`, {});
      return { data: json as EndpointTestResult };
    },
    async rotateWebhookSecret(endpointId, overlapSeconds) {
      const { json } = await post(`/webhook-endpoints/${id(endpointId)}/rotate-secret`, { overlapSeconds });
      return { data: json as WebhookEndpointWithSecret };
    },
    async replayWebhookDelivery(deliveryId) {
      const { json } = await post(`/webhook-deliveries/${id(deliveryId)}/replay`, {});
      return { data: json as DeliveryDetail };
    },
    async uploadMaterialSystemDocument(systemId, input) {
      const form = new FormData();
      form.append('kind', input.kind);
      if (input.title?.trim()) form.append('title', input.title.trim());
      form.append('file', input.file, input.file.name);
      const { json } = await http.fetchJson(`${apiBase}/material-systems/${id(systemId)}/documents`, { method: 'POST', body: form });
      return { data: json as MaterialSystemDocument };
    },
    async downloadDocument(href) {
      const { blob } = await http.fetchJson(href, { asBlob: true, headers: { Accept: 'application/pdf' } });
      return blob ?? new Blob([]);
    },
    async getOverview(query) {
      const qs = new URLSearchParams();
      for (const [k, v] of Object.entries(query)) if (v !== undefined && v !== null && v !== '') qs.set(k, String(v));
      const { json } = await get(`/overview${qs.size ? `?${qs}` : ''}`);
      return { data: json as Overview };
    },
    async getProfile() {
      const { json } = await get('/me');
      return { data: json as Profile };
    },
    async updateProfile(patch) {
      const { json } = await http.fetchJson(`${apiBase}/me`, { method: 'PATCH', body: JSON.stringify(patch) });
      return { data: json as Profile };
    },
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
      return json as InvitationAccepted;
    },
    async lookupInvitation(token) {
      const { json } = await post('/invitations/lookup', { token }, true);
      return json as InvitationPreview;
    },
  };
}
