/**
 * The API's response bodies, as the SDK generates them from schemas/<name>.schema.json. The console
 * declares no response shape of its own: when a view changes, the typecheck shows every screen it
 * touches.
 */
// the generated file alone: the SDK's runtime client is not the console's concern
import type { components } from '@pourgate/sdk/src/schema';

type Schemas = components['schemas'];

export type User = Schemas['user.view'];
export type Invitation = Schemas['invitation.view'];
export type InvitationState = Invitation['state'];
export type InvitationPreview = Schemas['invitation.preview'];
/** The answer to accepting an invitation: the new account, signed in. */
export type InvitationAccepted = Schemas['invitation.accepted'];
export type ApiKey = Schemas['api-key.view'];
export type ApiKeyState = ApiKey['state'];
export type ApiKeyKind = ApiKey['kind'];
export type ApiKeyEnvironment = ApiKey['environment'];
/** Only the create and rotate answers carry the secret, and only once. */
export type ApiKeyWithSecret = Schemas['api-key.created'];
export type AuditEntry = Schemas['audit-entry.view'];
export type ActorType = AuditEntry['actorType'];

export type Batch = Schemas['batch.view'];
export type BatchState = Batch['state'];
export type BatchTransition = Schemas['batch-transition.view'];
export type BatchTargets = Schemas['batch-targets.view'];
export type TargetsPreview = Schemas['targets.view'];
export type TargetFigures = Schemas['targets.figures'];
/** A batch's stored targets or a preview: the figures, plus the batch fields on a stored one. */
export type TargetsView = TargetFigures & Partial<Pick<BatchTargets, 'batchId' | 'state' | 'computedAt'>>;
type Components = TargetFigures['components'];
/** One row of a components table: part A or B (with side, band and volume) or the pigment. */
export type ComponentTarget = Omit<Components['pigment'], 'percentOfAB'> & Partial<Omit<Components['A'], 'mass' | 'massUnrounded'>> & { percentOfAB?: number };
export type TargetWarning = Schemas['batch-warning'];
export type Caution = Schemas['caution'];
export type DisplayedQuantity = Schemas['displayed-quantity'];

export type Reading = Schemas['reading.view'];
export type ReadingStatus = Reading['status'];
export type ReadingQuantity = Reading['quantity'];
export type ReadingSubject = Reading['subject'];
export type ReadingReview = NonNullable<Reading['review']>;
export type ReadingReason = Schemas['reading.reason'];

export type Device = Schemas['device.view'];
export type Lot = Schemas['lot.view'];
export type Mold = Schemas['mold.view'];
export type MaterialSystem = Schemas['material-system.view'];
export type MaterialSystemRevision = Schemas['material-system-revision.view'];
export type MaterialSystemDocument = Schemas['document.view'];
export type WorkOrder = Schemas['work-order.view'];
export type CupTest = Schemas['qc-cup-test.view'];
export type ImportJob = Schemas['import.view'];

export type WebhookEndpoint = Schemas['webhook-endpoint.view'];
export type WebhookEndpointWithSecret = Schemas['webhook-endpoint.created'];
export type EndpointTestResult = Schemas['webhook-test.result'];
export type WebhookDelivery = Schemas['webhook-delivery.view'];
export type DeliveryStatus = WebhookDelivery['status'];
export type DeliveryDetail = Schemas['webhook-delivery.detail'];

export type Overview = Schemas['overview.view'];
export type ReleaseCheck = Schemas['batch-release-check.view'];
export type OverviewQuery = Schemas['overview.query'];

export type Profile = Schemas['me'];
export type ProfileUpdate = Schemas['me.update'];
export type NotifyRejections = NonNullable<ProfileUpdate['notifyRejections']>;
export type NotifyDrift = NonNullable<ProfileUpdate['notifyDrift']>;

// planning (issue #18): the request body the console sends to plan a batch, and the preview it shows first
export type BatchPlanBody = Schemas['batch.create'];
export type BatchOptions = Schemas['batch-options'];
export type TargetsPreviewBody = Schemas['targets.preview'];
export type BatchPlanProposal = Schemas['batch-plan.view'];
export type Consumption = Schemas['consumption.view'];
export type ConsumptionMaterial = Schemas['consumption-material'];
export type LotGenealogy = Schemas['lot-genealogy.view'];
export type RecallReport = Schemas['recall.view'];
export type BatchGenealogy = Schemas['batch-genealogy.view'];
export type Part = Schemas['part.view'];
export type PartRecord = Schemas['part.create'];
export type Specimen = Schemas['specimen.view'];
export type SpecimenRecord = Schemas['specimen.create'];
export type BatchDisposition = Schemas['batch-disposition.view'];
export type BatchDispositionRecord = Schemas['batch-disposition.create'];
export type DefectCause = Schemas['defect-cause.view'];
export type Pareto = Schemas['pareto.view'];
export type ParetoQuery = Schemas['pareto.query'];
