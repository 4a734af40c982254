/**
 * Generated from sdk/openapi.json by openapi-typescript. Do not edit: run `npm run sdk:generate`.
 */

export interface paths {
    "/v1/audit-events": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** The audit log: sign-ins, invitations, role changes, keys, review decisions */
        get: operations["Audit_list"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/users": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** People of the organization */
        get: operations["Users_list"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/users/{id}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** One person */
        get: operations["Users_get"];
        /**
         * Change a person’s name, role or disabled state
         * @description Disabling ends the person’s sessions. The last active admin cannot be demoted or disabled (409).
         */
        put: operations["Users_update"];
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/invitations": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Invitations sent */
        get: operations["Invitations_list"];
        put?: never;
        /**
         * Invite a person by e-mail
         * @description The e-mail carries a one-time link that expires (INVITATION_TTL_HOURS). Inviting the same address again revokes the earlier link.
         */
        post: operations["Invitations_invite"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/invitations/{id}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** One invitation */
        get: operations["Invitations_get"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/invitations/{id}/revoke": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /** Revoke a pending invitation */
        post: operations["Invitations_revoke"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/invitations/lookup": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * What an invitation link offers
         * @description The shop, the role, the invited address and the name the admin typed, for the acceptance page. The token goes in the body (never in a URL, so it stays out of logs); a used, revoked or expired link answers 410.
         */
        post: operations["Invitations_lookup"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/invitations/accept": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Accept an invitation: set name and password
         * @description Works once; a used, revoked or expired link answers 410. The answer carries a session: the person is signed in.
         */
        post: operations["Invitations_accept"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/api-keys": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** API keys: prefix, name, scopes, creator, last use, expiry, state (never the secret) */
        get: operations["ApiKeys_list"];
        put?: never;
        /**
         * Issue an API key
         * @description The response carries `secret` — the only time it is shown. Send it in the X-Api-Key header. The scopes must be ones the issuer may grant (integrators: the device scopes), and a device key holds only the device scopes; otherwise 403 naming the refused scopes.
         */
        post: operations["ApiKeys_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/api-keys/{id}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** One API key (never the secret) */
        get: operations["ApiKeys_get"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/api-keys/{id}/revoke": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Revoke a key at once
         * @description Ends every secret of the key together: its predecessor still in a rotation grace period and any successor too. A revoked key cannot be rotated (409).
         */
        post: operations["ApiKeys_revoke"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/api-keys/{id}/rotate": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /** Rotate a key: a new secret now, the old one valid for the grace period */
        post: operations["ApiKeys_rotate"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/auth/sign-in": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Sign in with e-mail and password
         * @description Every attempt is counted before the password is checked, per account (also for unknown addresses) and per client address (429 with Retry-After). The message never says whether the e-mail exists.
         */
        post: operations["Auth_signIn"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/auth/refresh": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Trade a refresh token for a new session
         * @description Refresh tokens rotate: each works once. Presenting a used one ends every session of its family.
         */
        post: operations["Auth_refresh"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/auth/sign-out": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /** End the session of a refresh token (and its rotations) */
        post: operations["Auth_signOut"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/me": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** The signed-in person, their organization and allowed actions */
        get: operations["Auth_me"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        /** Change one’s own name, unit system, notification setting or password */
        patch: operations["Auth_updateMe"];
        trace?: never;
    };
    "/v1/devices": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Scales, thermometers, hygrometers, loggers and gateways */
        get: operations["Devices_list"];
        put?: never;
        /**
         * Register a device
         * @description Scales need readability (the division d) and capacity, in any mass unit; stored in kg.
         */
        post: operations["Devices_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/devices/{id}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** One device */
        get: operations["Devices_get"];
        /** Change a device (station, calibration due date, readability, retired) */
        put: operations["Devices_update"];
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/material-systems": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Material systems (two-part formulations), each at its current revision */
        get: operations["MaterialSystems_list"];
        put?: never;
        /**
         * Define a material system
         * @description Quantities in any accepted unit; stored in SI. The mix ratio tolerance is ±5 % unless given.
         */
        post: operations["MaterialSystems_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/material-systems/{id}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** One material system at its current revision */
        get: operations["MaterialSystems_get"];
        /**
         * Revise a material system
         * @description The whole system again. A change of any parameter writes a new revision and makes it current.
         */
        put: operations["MaterialSystems_update"];
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/material-systems/{id}/revisions": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * Every revision of a material system, newest first
         * @description Batches keep the revision they were computed with.
         */
        get: operations["MaterialSystems_revisions"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/material-systems/{id}/documents": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * The system's SDS and TDS documents
         * @description Everyone who reads shop data can reach the SDS of every chemical they handle.
         */
        get: operations["Documents_list"];
        put?: never;
        /** Upload an SDS or TDS (PDF, multipart/form-data) */
        post: operations["Documents_upload"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/material-systems/{id}/documents/{documentId}/content": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Download a document (application/pdf) */
        get: operations["Documents_content"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/lots": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Component lots (part A, part B, pigment) with their received, opened and expiry dates */
        get: operations["Lots_list"];
        put?: never;
        /** Record a received lot */
        post: operations["Lots_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/lots/{id}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** One lot */
        get: operations["Lots_get"];
        /**
         * Change a lot (e.g. the date it was opened)
         * @description Part and material system cannot change once batches or cup tests use the lot.
         */
        put: operations["Lots_update"];
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/lots/{id}/release-hold": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Release a lot held by a failed cup test
         * @description An engineer decides the lot may be used again, with a note saying why (audited; emits lot.hold_released). 409 when the lot is not on hold.
         */
        post: operations["Lots_releaseHold"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/molds": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Molds with their cavity volumes (m³) */
        get: operations["Molds_list"];
        put?: never;
        /**
         * Define a mold
         * @description Cavity from box or cylinder dimensions, a water fill (mass ÷ density of water at its temperature) or an entered volume; less inserts; times cavities.
         */
        post: operations["Molds_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/molds/{id}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** One mold */
        get: operations["Molds_get"];
        /** Change a mold (the whole record) */
        put: operations["Molds_update"];
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/work-orders": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Work orders */
        get: operations["WorkOrders_list"];
        put?: never;
        /**
         * Post a work order (the ERP, with a key scoped work-orders:write)
         * @description Idempotent on externalRef: the same reference and body again answers 200 with the existing order; a different body for the same reference answers 409.
         */
        post: operations["WorkOrders_post"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/work-orders/{id}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** One work order */
        get: operations["WorkOrders_get"];
        /** Change a work order (state, quantity, due date, ...) */
        put: operations["WorkOrders_update"];
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/parts": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Demolded parts with their molded density, specimens and disposition (filter batchId, workOrderId, disposition) */
        get: operations["Parts_list"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/parts/{id}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** One part */
        get: operations["Parts_get"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/parts/{id}/specimens": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Record a test specimen of a part
         * @description core_density: mass ÷ volume of the specimen (ASTM D3574 Test A / ISO 845); indentation_force: force at 25 % deflection (ASTM D3574 Test B1); durometer (ASTM D2240). Judged against the system’s spec. Answers the part.
         */
        post: operations["Parts_specimen"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/batches/{id}/parts": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Record a demolded part of a batch
         * @description Molded density = mass ÷ cavity volume (as stored with the batch), judged against the batch’s target density ± the system’s part tolerance (10 % when it states none). A device key records on its own scale.
         */
        post: operations["BatchParts_record"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/batches/{id}/disposition": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** A batch’s disposition (404 until it has one) */
        get: operations["BatchParts_disposition"];
        put?: never;
        /**
         * Dispose of a batch’s parts: accepted, rework or scrap, with defect causes
         * @description Once per batch (a second is a 409). Emits batch.disposed.
         */
        post: operations["BatchParts_dispose"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/batches/{id}/genealogy": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** What went into a batch (its lots) and what came out (its parts and disposition) */
        get: operations["BatchParts_genealogy"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/defect-causes": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** The organization’s defect causes (seeded with trade terms: voids, short fill, skin defects, splits, shrinkage, tack, ...) */
        get: operations["DefectCauses_list"];
        put?: never;
        /** Add a defect cause */
        post: operations["DefectCauses_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/defect-causes/{id}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** One defect cause */
        get: operations["DefectCauses_get"];
        /** Rename, describe or retire a defect cause (its code stays) */
        put: operations["DefectCauses_update"];
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/work-orders/{id}/batch-plan": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** The batches a work order still needs: ceil(parts remaining ÷ mold cavities), with a body for POST /v1/batches each */
        get: operations["WorkOrderProduction_plan"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/work-orders/{id}/consumption": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * Consumption and yield: planned vs actual mass of A, B and pigment by lot, parts good/rework/scrap, scrap mass
         * @description 409 while the work order has no batch.
         */
        get: operations["WorkOrderProduction_consumption"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/work-orders/{id}/consumption.csv": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Consumption and yield as CSV (one row per material and lot; the JSON form is GET /v1/work-orders/{id}/consumption) */
        get: operations["WorkOrderProduction_consumptionCsv"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/work-orders/{id}/complete": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Complete a work order: state done, and work_order.completed carries its consumption for the ERP to back-flush stock
         * @description 409 when it has no batch or is done or cancelled already.
         */
        post: operations["WorkOrderProduction_complete"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/lots/{id}/genealogy": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Where a lot went: its batches (with their other lots), work orders and parts */
        get: operations["LotTrace_genealogy"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/lots/{id}/recall": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** The recall report of a lot: every batch it went into, its part count, work order and disposition */
        get: operations["LotTrace_report"];
        put?: never;
        /**
         * Recall a lot: it goes into no new batch (without an override), and lot.recalled tells the ERP
         * @description 409 when already recalled. Answers the recall report.
         */
        post: operations["LotTrace_recall"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/lots/{id}/recall.csv": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** The recall report as CSV (the JSON form is GET /v1/lots/{id}/recall) */
        get: operations["LotTrace_reportCsv"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/defects/pareto": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * A Pareto of defect causes over a period, per system, mold or station
         * @description Largest first with the running share; computed by the API.
         */
        get: operations["Defects_pareto"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/targets/preview": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Compute batch targets without storing anything
         * @description A system (by id, or inline) and a mold (by id, inline, or a free-rise cup) with options give every figure with its unit and SI alongside, warnings, and the cautions. Nothing is written.
         */
        post: operations["Targets_preview"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/batches": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Batches (one mix each), newest first */
        get: operations["Batches_list"];
        put?: never;
        /**
         * Plan a batch and compute its targets
         * @description From a work order or ad hoc. The targets are computed once, now, and stored with every input and the computation version.
         */
        post: operations["Batches_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/batches/{id}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** One batch, with a summary of its targets (kg) */
        get: operations["Batches_get"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/batches/{id}/targets": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * The targets stored with a batch
         * @description Exactly as computed when the batch was planned (the system revision and mold volume of that moment), in the caller's unit system with SI alongside.
         */
        get: operations["Batches_targets"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/batches/{id}/transitions": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** The state history of a batch */
        get: operations["Batches_transitions"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/readings": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Readings and their verdicts (the review queue is status=rejected) */
        get: operations["Readings_list"];
        put?: never;
        /**
         * Post one reading
         * @description 202 with a status URL; judged by a queued job. The same (device, clientReadingId) again answers 200 with the first reading and replayed: true.
         */
        post: operations["Readings_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/readings/{id}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** One reading, with its verdict and reasons */
        get: operations["Readings_get"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/readings/bulk": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Post up to 1000 readings
         * @description All or nothing: one bad item refuses the whole post, with a pointer to each bad field.
         */
        post: operations["Readings_bulk"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/readings/{id}/review": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Waive or uphold a rejected reading
         * @description A waiver needs a note; upholding holds the batch, or scraps it with scrap: true.
         */
        post: operations["Readings_review"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/batches/{id}/release-check": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * What a batch still needs before release
         * @description Every component its targets name (A, B, the pigment when weighed separately) and what its system asks for (milestones, temperatures), each recorded and accepted or waived; and rejections still open.
         */
        get: operations["BatchRelease_check"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/batches/{id}/release": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Release a batch
         * @description When the batch is complete (see release-check) and every rejected reading was waived (or none was rejected); 409 with what is missing otherwise.
         */
        post: operations["BatchRelease_release"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/live/tickets": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * A ticket for the live station stream
         * @description EventSource cannot send an Authorization header: this authenticated call hands out a ticket (valid 60 s) for GET /v1/live/stream?ticket=…. Name a station or a device to watch, or neither for every device.
         */
        post: operations["Live_ticket"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/live/stream": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * Live readings as Server-Sent Events
         * @description Authenticated by the ticket in the query string (not a header: EventSource cannot set one). The stream opens with an event `ready` (live.ready: the devices watched), then sends an event `reading` (live.event) each time a watched scale posts a reading, when it is judged (with its reasons), and when it is reviewed. A comment line every 15 s keeps it open. Readings written while the stream was closed are not replayed: read them from GET /v1/readings.
         */
        get: operations["Live_stream"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/control/charts": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Control charts: a metric of a material system, optionally of one station, device or lot */
        get: operations["Control_listCharts"];
        put?: never;
        /**
         * Define a control chart and the run rules it watches
         * @description Limits are trial until a baseline is frozen; signals are raised against frozen limits only.
         */
        post: operations["Control_createChart"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/control/charts/{id}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** One control chart with its baseline */
        get: operations["Control_getChart"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        /** Rename a chart or change its run rules */
        patch: operations["Control_updateChart"];
        trace?: never;
    };
    "/v1/control/charts/{id}/baseline": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * Freeze the limits from the first N points or from a period
         * @description Fewer points than the chart’s rules need is a 422 and nothing changes.
         */
        post: operations["Control_freeze"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/control/charts/{id}/data": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** The chart: points with moving ranges, centre line, limits, zones, signals and capability (computed in PostgreSQL) */
        get: operations["Control_data"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/control/charts/{id}/data.csv": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** The chart’s points as CSV */
        get: operations["Control_csv"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/control/signals": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Run-rule signals (filter acknowledged=false for the open ones) */
        get: operations["Control_listSignals"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/control/signals/{id}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** One signal with the points of its pattern */
        get: operations["Control_getSignal"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/control/signals/{id}/acknowledge": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /** Acknowledge a signal with a note saying what was found */
        post: operations["Control_acknowledge"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/imports": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Imports, newest first */
        get: operations["Imports_list"];
        put?: never;
        /**
         * Import a logger CSV
         * @description 202 with the import and its status URL; a queued job checks and ingests every row (GET /v1/imports/{id} shows processed/total, percent and the bad rows with their line numbers).
         */
        post: operations["Imports_upload"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/imports/{id}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** One import: status, progress and bad rows */
        get: operations["Imports_get"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/qc-cup-tests": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** QC cup tests (ASTM D7487 terms: cream, top-of-cup and tack-free times; free-rise density) */
        get: operations["QcCupTests_list"];
        put?: never;
        /**
         * Record a cup test
         * @description It joins the system's least-squares fit of expected free-rise density against component temperature.
         */
        post: operations["QcCupTests_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/qc-cup-tests/{id}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** One cup test */
        get: operations["QcCupTests_get"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/material-systems/{id}/free-rise-fit": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * The least-squares line of the system's cup tests: free-rise density against component temperature
         * @description Null fit below three cups or when all were at one temperature.
         */
        get: operations["QcCupTests_fit"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/events": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * The event feed, for systems that poll instead of receiving webhooks
         * @description Pass the `next` cursor of one page as `after` to get the following page; every event appears once, in order. Types: webhook.test, reading.accepted, reading.rejected, reading.waived, reading.upheld, batch.created, batch.state_changed, batch.released, batch.on_hold, batch.scrapped, lot.held, lot.hold_released, work_order.created, work_order.changed, work_order.completed, batch.disposed, lot.recalled, drift.detected, drift.acknowledged.
         */
        get: operations["Events_feed"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/webhook-endpoints": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Webhook endpoints (never their secrets) */
        get: operations["WebhookEndpoints_list"];
        put?: never;
        /**
         * Add an endpoint
         * @description The response carries `secret` (Standard Webhooks `whsec_…`), shown this once. URLs must be http(s) and resolve to public addresses.
         */
        post: operations["WebhookEndpoints_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/webhook-endpoints/{id}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** One webhook endpoint */
        get: operations["WebhookEndpoints_get"];
        /** Change an endpoint (URL, description, event types, enabled) */
        put: operations["WebhookEndpoints_update"];
        post?: never;
        /** Remove an endpoint (returns what was removed) */
        delete: operations["WebhookEndpoints_remove"];
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/webhook-endpoints/{id}/rotate-secret": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * New signing secret; both sign during the overlap
         * @description During the overlap every delivery carries two signatures in webhook-signature, so receivers can switch at their pace.
         */
        post: operations["WebhookEndpoints_rotate"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/webhook-endpoints/{id}/test": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /** Send a webhook.test event now and see what the receiver answered */
        post: operations["WebhookEndpoints_test"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/webhook-deliveries": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** The delivery log: status, attempts, last answer, next attempt */
        get: operations["WebhookDeliveries_list"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/webhook-deliveries/{id}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** One delivery with every attempt */
        get: operations["WebhookDeliveries_get"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/webhook-deliveries/{id}/replay": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /** Send a finished (delivered, dead or cancelled) delivery again, same webhook-id */
        post: operations["WebhookDeliveries_replay"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/webhook-deliveries/replay": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /** Replay every dead-lettered delivery since a time (optionally of one endpoint) */
        post: operations["WebhookDeliveries_replayAll"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/admin/queue-sessions": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * A pass to the queue dashboard (admins)
         * @description Sets an HttpOnly cookie, valid 15 minutes on /queues only, that lets this browser open the queue dashboard (waiting, active, delayed and failed jobs of every queue, read-only).
         */
        post: operations["QueueDashboard_open"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/overview": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * The shop floor at a glance: pours today, open rejections, rejection rate per day, ratio error per batch
         * @description Counted in PostgreSQL over every reading of the organization, exact at any volume. Days are calendar days in timeZone.
         */
        get: operations["Overview_get"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/health": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /**
         * Liveness: the process answers
         * @description Never touches PostgreSQL or Redis.
         */
        get: operations["Health_alive"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/v1/ready": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Readiness: PostgreSQL and Redis are reachable */
        get: operations["Health_ready"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
}
export interface webhooks {
    "webhook.test": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * A test event sent from POST /v1/webhook-endpoints/{id}/test
         * @description Delivered with the headers webhook-id (the event id, the same on every retry), webhook-timestamp and webhook-signature (Standard Webhooks, HMAC-SHA256 over "id.timestamp.body"). Answer 2xx within 15 s; 410 disables the endpoint.
         */
        post: {
            parameters: {
                query?: never;
                header?: never;
                path?: never;
                cookie?: never;
            };
            requestBody: {
                content: {
                    "application/json": components["schemas"]["event"] & {
                        /** @constant */
                        type?: "webhook.test";
                        data?: components["schemas"]["event.webhook.test"];
                    };
                };
            };
            responses: {
                /** @description Gone: Pourgate disables the endpoint */
                410: {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
                /** @description Received */
                "2XX": {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
            };
        };
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "reading.accepted": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * A reading was judged within every tolerance
         * @description Delivered with the headers webhook-id (the event id, the same on every retry), webhook-timestamp and webhook-signature (Standard Webhooks, HMAC-SHA256 over "id.timestamp.body"). Answer 2xx within 15 s; 410 disables the endpoint.
         */
        post: {
            parameters: {
                query?: never;
                header?: never;
                path?: never;
                cookie?: never;
            };
            requestBody: {
                content: {
                    "application/json": components["schemas"]["event"] & {
                        /** @constant */
                        type?: "reading.accepted";
                        data?: components["schemas"]["event.reading.accepted"];
                    };
                };
            };
            responses: {
                /** @description Gone: Pourgate disables the endpoint */
                410: {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
                /** @description Received */
                "2XX": {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
            };
        };
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "reading.rejected": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * A reading was judged outside a tolerance; the reasons say which and by how much
         * @description Delivered with the headers webhook-id (the event id, the same on every retry), webhook-timestamp and webhook-signature (Standard Webhooks, HMAC-SHA256 over "id.timestamp.body"). Answer 2xx within 15 s; 410 disables the endpoint.
         */
        post: {
            parameters: {
                query?: never;
                header?: never;
                path?: never;
                cookie?: never;
            };
            requestBody: {
                content: {
                    "application/json": components["schemas"]["event"] & {
                        /** @constant */
                        type?: "reading.rejected";
                        data?: components["schemas"]["event.reading.rejected"];
                    };
                };
            };
            responses: {
                /** @description Gone: Pourgate disables the endpoint */
                410: {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
                /** @description Received */
                "2XX": {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
            };
        };
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "reading.waived": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * An engineer accepted a rejected reading anyway, with a note
         * @description Delivered with the headers webhook-id (the event id, the same on every retry), webhook-timestamp and webhook-signature (Standard Webhooks, HMAC-SHA256 over "id.timestamp.body"). Answer 2xx within 15 s; 410 disables the endpoint.
         */
        post: {
            parameters: {
                query?: never;
                header?: never;
                path?: never;
                cookie?: never;
            };
            requestBody: {
                content: {
                    "application/json": components["schemas"]["event"] & {
                        /** @constant */
                        type?: "reading.waived";
                        data?: components["schemas"]["event.reading.waived"];
                    };
                };
            };
            responses: {
                /** @description Gone: Pourgate disables the endpoint */
                410: {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
                /** @description Received */
                "2XX": {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
            };
        };
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "reading.upheld": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * An engineer confirmed a rejection
         * @description Delivered with the headers webhook-id (the event id, the same on every retry), webhook-timestamp and webhook-signature (Standard Webhooks, HMAC-SHA256 over "id.timestamp.body"). Answer 2xx within 15 s; 410 disables the endpoint.
         */
        post: {
            parameters: {
                query?: never;
                header?: never;
                path?: never;
                cookie?: never;
            };
            requestBody: {
                content: {
                    "application/json": components["schemas"]["event"] & {
                        /** @constant */
                        type?: "reading.upheld";
                        data?: components["schemas"]["event.reading.upheld"];
                    };
                };
            };
            responses: {
                /** @description Gone: Pourgate disables the endpoint */
                410: {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
                /** @description Received */
                "2XX": {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
            };
        };
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "batch.created": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * A batch was planned and its targets computed
         * @description Delivered with the headers webhook-id (the event id, the same on every retry), webhook-timestamp and webhook-signature (Standard Webhooks, HMAC-SHA256 over "id.timestamp.body"). Answer 2xx within 15 s; 410 disables the endpoint.
         */
        post: {
            parameters: {
                query?: never;
                header?: never;
                path?: never;
                cookie?: never;
            };
            requestBody: {
                content: {
                    "application/json": components["schemas"]["event"] & {
                        /** @constant */
                        type?: "batch.created";
                        data?: components["schemas"]["event.batch.created"];
                    };
                };
            };
            responses: {
                /** @description Gone: Pourgate disables the endpoint */
                410: {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
                /** @description Received */
                "2XX": {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
            };
        };
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "batch.state_changed": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * A batch moved from one state to another
         * @description Delivered with the headers webhook-id (the event id, the same on every retry), webhook-timestamp and webhook-signature (Standard Webhooks, HMAC-SHA256 over "id.timestamp.body"). Answer 2xx within 15 s; 410 disables the endpoint.
         */
        post: {
            parameters: {
                query?: never;
                header?: never;
                path?: never;
                cookie?: never;
            };
            requestBody: {
                content: {
                    "application/json": components["schemas"]["event"] & {
                        /** @constant */
                        type?: "batch.state_changed";
                        data?: components["schemas"]["event.batch.state_changed"];
                    };
                };
            };
            responses: {
                /** @description Gone: Pourgate disables the endpoint */
                410: {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
                /** @description Received */
                "2XX": {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
            };
        };
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "batch.released": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * A batch was released: every rejection waived or none
         * @description Delivered with the headers webhook-id (the event id, the same on every retry), webhook-timestamp and webhook-signature (Standard Webhooks, HMAC-SHA256 over "id.timestamp.body"). Answer 2xx within 15 s; 410 disables the endpoint.
         */
        post: {
            parameters: {
                query?: never;
                header?: never;
                path?: never;
                cookie?: never;
            };
            requestBody: {
                content: {
                    "application/json": components["schemas"]["event"] & {
                        /** @constant */
                        type?: "batch.released";
                        data?: components["schemas"]["event.batch.released"];
                    };
                };
            };
            responses: {
                /** @description Gone: Pourgate disables the endpoint */
                410: {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
                /** @description Received */
                "2XX": {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
            };
        };
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "batch.on_hold": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * A batch was put on hold pending review
         * @description Delivered with the headers webhook-id (the event id, the same on every retry), webhook-timestamp and webhook-signature (Standard Webhooks, HMAC-SHA256 over "id.timestamp.body"). Answer 2xx within 15 s; 410 disables the endpoint.
         */
        post: {
            parameters: {
                query?: never;
                header?: never;
                path?: never;
                cookie?: never;
            };
            requestBody: {
                content: {
                    "application/json": components["schemas"]["event"] & {
                        /** @constant */
                        type?: "batch.on_hold";
                        data?: components["schemas"]["event.batch.on_hold"];
                    };
                };
            };
            responses: {
                /** @description Gone: Pourgate disables the endpoint */
                410: {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
                /** @description Received */
                "2XX": {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
            };
        };
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "batch.scrapped": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * A batch was scrapped
         * @description Delivered with the headers webhook-id (the event id, the same on every retry), webhook-timestamp and webhook-signature (Standard Webhooks, HMAC-SHA256 over "id.timestamp.body"). Answer 2xx within 15 s; 410 disables the endpoint.
         */
        post: {
            parameters: {
                query?: never;
                header?: never;
                path?: never;
                cookie?: never;
            };
            requestBody: {
                content: {
                    "application/json": components["schemas"]["event"] & {
                        /** @constant */
                        type?: "batch.scrapped";
                        data?: components["schemas"]["event.batch.scrapped"];
                    };
                };
            };
            responses: {
                /** @description Gone: Pourgate disables the endpoint */
                410: {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
                /** @description Received */
                "2XX": {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
            };
        };
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "lot.held": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * A lot was put on hold for new batches: a cup test of it failed the system's reactivity window or density band
         * @description Delivered with the headers webhook-id (the event id, the same on every retry), webhook-timestamp and webhook-signature (Standard Webhooks, HMAC-SHA256 over "id.timestamp.body"). Answer 2xx within 15 s; 410 disables the endpoint.
         */
        post: {
            parameters: {
                query?: never;
                header?: never;
                path?: never;
                cookie?: never;
            };
            requestBody: {
                content: {
                    "application/json": components["schemas"]["event"] & {
                        /** @constant */
                        type?: "lot.held";
                        data?: components["schemas"]["event.lot.held"];
                    };
                };
            };
            responses: {
                /** @description Gone: Pourgate disables the endpoint */
                410: {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
                /** @description Received */
                "2XX": {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
            };
        };
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "lot.hold_released": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * An engineer released a held lot, with a note saying why
         * @description Delivered with the headers webhook-id (the event id, the same on every retry), webhook-timestamp and webhook-signature (Standard Webhooks, HMAC-SHA256 over "id.timestamp.body"). Answer 2xx within 15 s; 410 disables the endpoint.
         */
        post: {
            parameters: {
                query?: never;
                header?: never;
                path?: never;
                cookie?: never;
            };
            requestBody: {
                content: {
                    "application/json": components["schemas"]["event"] & {
                        /** @constant */
                        type?: "lot.hold_released";
                        data?: components["schemas"]["event.lot.hold_released"];
                    };
                };
            };
            responses: {
                /** @description Gone: Pourgate disables the endpoint */
                410: {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
                /** @description Received */
                "2XX": {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
            };
        };
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "work_order.created": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * A work order arrived (from the ERP or an engineer)
         * @description Delivered with the headers webhook-id (the event id, the same on every retry), webhook-timestamp and webhook-signature (Standard Webhooks, HMAC-SHA256 over "id.timestamp.body"). Answer 2xx within 15 s; 410 disables the endpoint.
         */
        post: {
            parameters: {
                query?: never;
                header?: never;
                path?: never;
                cookie?: never;
            };
            requestBody: {
                content: {
                    "application/json": components["schemas"]["event"] & {
                        /** @constant */
                        type?: "work_order.created";
                        data?: components["schemas"]["event.work_order.created"];
                    };
                };
            };
            responses: {
                /** @description Gone: Pourgate disables the endpoint */
                410: {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
                /** @description Received */
                "2XX": {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
            };
        };
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "work_order.changed": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * A work order was changed
         * @description Delivered with the headers webhook-id (the event id, the same on every retry), webhook-timestamp and webhook-signature (Standard Webhooks, HMAC-SHA256 over "id.timestamp.body"). Answer 2xx within 15 s; 410 disables the endpoint.
         */
        post: {
            parameters: {
                query?: never;
                header?: never;
                path?: never;
                cookie?: never;
            };
            requestBody: {
                content: {
                    "application/json": components["schemas"]["event"] & {
                        /** @constant */
                        type?: "work_order.changed";
                        data?: components["schemas"]["event.work_order.changed"];
                    };
                };
            };
            responses: {
                /** @description Gone: Pourgate disables the endpoint */
                410: {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
                /** @description Received */
                "2XX": {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
            };
        };
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "work_order.completed": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * A work order was completed: its consumption by lot and its parts, for the ERP to back-flush stock
         * @description Delivered with the headers webhook-id (the event id, the same on every retry), webhook-timestamp and webhook-signature (Standard Webhooks, HMAC-SHA256 over "id.timestamp.body"). Answer 2xx within 15 s; 410 disables the endpoint.
         */
        post: {
            parameters: {
                query?: never;
                header?: never;
                path?: never;
                cookie?: never;
            };
            requestBody: {
                content: {
                    "application/json": components["schemas"]["event"] & {
                        /** @constant */
                        type?: "work_order.completed";
                        data?: components["schemas"]["event.work_order.completed"];
                    };
                };
            };
            responses: {
                /** @description Gone: Pourgate disables the endpoint */
                410: {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
                /** @description Received */
                "2XX": {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
            };
        };
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "batch.disposed": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * A batch's parts were judged after demold (accepted, rework, scrap) with defect causes
         * @description Delivered with the headers webhook-id (the event id, the same on every retry), webhook-timestamp and webhook-signature (Standard Webhooks, HMAC-SHA256 over "id.timestamp.body"). Answer 2xx within 15 s; 410 disables the endpoint.
         */
        post: {
            parameters: {
                query?: never;
                header?: never;
                path?: never;
                cookie?: never;
            };
            requestBody: {
                content: {
                    "application/json": components["schemas"]["event"] & {
                        /** @constant */
                        type?: "batch.disposed";
                        data?: components["schemas"]["event.batch.disposed"];
                    };
                };
            };
            responses: {
                /** @description Gone: Pourgate disables the endpoint */
                410: {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
                /** @description Received */
                "2XX": {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
            };
        };
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "lot.recalled": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * A lot was recalled: it goes into no new batch, and the count of batches and work orders it went into
         * @description Delivered with the headers webhook-id (the event id, the same on every retry), webhook-timestamp and webhook-signature (Standard Webhooks, HMAC-SHA256 over "id.timestamp.body"). Answer 2xx within 15 s; 410 disables the endpoint.
         */
        post: {
            parameters: {
                query?: never;
                header?: never;
                path?: never;
                cookie?: never;
            };
            requestBody: {
                content: {
                    "application/json": components["schemas"]["event"] & {
                        /** @constant */
                        type?: "lot.recalled";
                        data?: components["schemas"]["event.lot.recalled"];
                    };
                };
            };
            responses: {
                /** @description Gone: Pourgate disables the endpoint */
                410: {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
                /** @description Received */
                "2XX": {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
            };
        };
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "drift.detected": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * A run rule of a control chart fired: the process is moving before readings leave tolerance
         * @description Delivered with the headers webhook-id (the event id, the same on every retry), webhook-timestamp and webhook-signature (Standard Webhooks, HMAC-SHA256 over "id.timestamp.body"). Answer 2xx within 15 s; 410 disables the endpoint.
         */
        post: {
            parameters: {
                query?: never;
                header?: never;
                path?: never;
                cookie?: never;
            };
            requestBody: {
                content: {
                    "application/json": components["schemas"]["event"] & {
                        /** @constant */
                        type?: "drift.detected";
                        data?: components["schemas"]["event.drift.detected"];
                    };
                };
            };
            responses: {
                /** @description Gone: Pourgate disables the endpoint */
                410: {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
                /** @description Received */
                "2XX": {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
            };
        };
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "drift.acknowledged": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        /**
         * An engineer acknowledged a drift signal with a note
         * @description Delivered with the headers webhook-id (the event id, the same on every retry), webhook-timestamp and webhook-signature (Standard Webhooks, HMAC-SHA256 over "id.timestamp.body"). Answer 2xx within 15 s; 410 disables the endpoint.
         */
        post: {
            parameters: {
                query?: never;
                header?: never;
                path?: never;
                cookie?: never;
            };
            requestBody: {
                content: {
                    "application/json": components["schemas"]["event"] & {
                        /** @constant */
                        type?: "drift.acknowledged";
                        data?: components["schemas"]["event.drift.acknowledged"];
                    };
                };
            };
            responses: {
                /** @description Gone: Pourgate disables the endpoint */
                410: {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
                /** @description Received */
                "2XX": {
                    headers: {
                        [name: string]: unknown;
                    };
                    content?: never;
                };
            };
        };
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
}
export interface components {
    schemas: {
        /** An API key (the fields every key view has) */
        "api-key.base": {
            /** Format: uuid */
            id: string;
            name: string;
            /** @enum {unknown} */
            kind: "device" | "integration";
            /** @enum {unknown} */
            environment: "live" | "test";
            scopes: ("readings:write" | "targets:read" | "work-orders:write" | "events:read" | "devices:read" | "shop:read")[];
            /** Format: uuid */
            deviceId: string | null;
            /** @description The first characters of the secret, to recognise it */
            prefix: string;
            /** @enum {unknown} */
            state: "active" | "grace" | "expired" | "revoked";
            /** Format: date-time */
            createdAt: string;
            createdBy: {
                /** Format: uuid */
                id: string;
                name: string | null;
            } | null;
            /** Format: uuid */
            rotatedFrom: string | null;
            /** Format: date-time */
            lastUsedAt: string | null;
            lastUsedIp: string | null;
            /** Format: date-time */
            expiresAt: string | null;
            /** Format: date-time */
            graceUntil: string | null;
            /** Format: date-time */
            revokedAt: string | null;
        };
        /** Issue an API key */
        "api-key.create": {
            /** @example Scale at station 2 */
            name: string;
            /**
             * @description device: a scale, thermometer or logger (may be bound to one device); integration: an ERP or other system
             * @enum {unknown}
             */
            kind: "device" | "integration";
            /**
             * @default live
             * @enum {unknown}
             */
            environment?: "live" | "test";
            scopes: ("readings:write" | "targets:read" | "work-orders:write" | "events:read" | "devices:read" | "shop:read")[];
            /**
             * Format: uuid
             * @description Bind a device key to one device: its readings are then attributed to it
             */
            deviceId?: string | null;
            /** Format: date-time */
            expiresAt?: string | null;
        };
        /** A new API key with its secret: the only time the secret is shown */
        "api-key.created": {
            /** @description Send it in the X-Api-Key header; store it now, it is not shown again */
            secret: string;
        } & components["schemas"]["api-key.base"];
        /** Rotate an API key */
        "api-key.rotate": {
            /**
             * @description How long the old secret keeps working (at most 7 days), so devices can be switched over
             * @default 86400
             */
            graceSeconds?: number;
        };
        /** An API key (never its secret) */
        "api-key.view": components["schemas"]["api-key.base"];
        /** One entry of the audit log */
        "audit-entry.view": {
            id: string;
            /** Format: date-time */
            createdAt: string;
            /** @enum {unknown} */
            actorType: "user" | "api_key" | "system" | "anonymous";
            actorId: string | null;
            actorLabel: string | null;
            /**
             * @example user.signed_in
             * @example reading.waived
             */
            action: string;
            targetType: string | null;
            targetId: string | null;
            details: Record<string, never>;
            ip: string | null;
            userAgent: string | null;
        };
        /** Refresh or end a session */
        "auth.refresh": {
            refreshToken: string;
        };
        /** A signed-in session */
        "auth.session": {
            /** @description JWT for Authorization: Bearer; short-lived */
            accessToken: string;
            /** Format: date-time */
            accessTokenExpiresAt: string;
            /** @description One use only: each refresh returns a new one */
            refreshToken: string;
            /** Format: date-time */
            refreshTokenExpiresAt: string;
            user: components["schemas"]["me"];
        };
        /** Sign in */
        "auth.sign-in": {
            /** Format: email */
            email: string;
            password: string;
        };
        /**
         * Decide what becomes of a batch's parts after demold
         * @description Each recorded part takes the batch decision unless listed in parts. A batch is disposed once (a second is a 409).
         */
        "batch-disposition.create": {
            /** @enum {unknown} */
            decision: "accepted" | "rework" | "scrap";
            /** @description Codes from GET /v1/defect-causes; at least one for rework or scrap */
            defectCauses?: string[];
            note?: string | null;
            /** @description Parts decided otherwise than the batch (one scrapped for voids in an accepted batch) */
            parts?: {
                /** Format: uuid */
                partId: string;
                /** @enum {unknown} */
                decision: "accepted" | "rework" | "scrap";
                defectCauses?: string[];
            }[];
        };
        /** A batch's disposition */
        "batch-disposition.view": {
            /** Format: uuid */
            batchId: string;
            /** Format: uuid */
            workOrderId: string | null;
            /** @enum {unknown} */
            decision: "accepted" | "rework" | "scrap";
            defectCauses: string[];
            note: string | null;
            parts: {
                accepted: number;
                rework: number;
                scrap: number;
                undecided: number;
            };
            decidedBy: string | null;
            /** Format: date-time */
            decidedAt: string;
        };
        /** What went into a batch and what came out */
        "batch-genealogy.view": {
            /** Format: uuid */
            batchId: string;
            state: string;
            /** Format: uuid */
            workOrderId: string | null;
            workOrderExternalRef: string | null;
            lots: {
                /** @enum {unknown} */
                part: "A" | "B" | "pigment";
                /** Format: uuid */
                id: string;
                lotNumber: string;
            }[];
            disposition: components["schemas"]["batch-disposition.view"] | null;
            parts: components["schemas"]["part.view"][];
        };
        /**
         * How to pour: density, pigment, allowances, scale, lots
         * @description Give a targetDensity or a packFactor (or neither, to use the mold's default pack factor). Percents are numbers (5 = 5 %).
         */
        "batch-options": {
            /** @description Molded (packed) density to aim at (density) */
            targetDensity?: components["schemas"]["quantity"];
            /** @description Molded density ÷ free-rise density */
            packFactor?: number;
            /** @description Pigment, percent of A+B */
            pigmentPercent?: number;
            /** @description Extra foam over what the cavity holds, percent of the foam mass */
            overfillPercent?: number;
            /** @description Share of the mixed mass left in the container, percent */
            retentionPercent?: number;
            /** @description multiplicative: m × (1 + a); delivered: m ÷ (1 − a). Default: overfill multiplicative, retention delivered. */
            allowanceConvention?: {
                /** @enum {unknown} */
                overfill: "multiplicative" | "delivered";
                /** @enum {unknown} */
                retention: "multiplicative" | "delivered";
            };
            /** @description Measured component temperature, for the expected free-rise density (temperature) */
            componentTemperature?: components["schemas"]["quantity"];
            /**
             * Format: uuid
             * @description A registered scale: masses are rounded to its readability
             */
            scaleDeviceId?: string;
            /** @description A scale given inline (instead of scaleDeviceId) */
            scale?: {
                readability: components["schemas"]["quantity"];
                capacity?: components["schemas"]["quantity"];
                /** Format: date */
                calibrationDueOn?: string;
            };
            lots?: {
                /** Format: uuid */
                A?: string;
                /** Format: uuid */
                B?: string;
                /** Format: uuid */
                pigment?: string;
            };
            /**
             * Format: date
             * @description The day of the pour (lot expiry and calibration are judged for it); today when not given
             */
            plannedFor?: string;
            /** @description Scale divisions the ratio band on the smaller part must span (5 when not given) */
            minimumToleranceDivisions?: number;
        };
        /**
         * The batches a work order still needs
         * @description Parts planned: the work order's batches not scrapped × the mold's cavities.
         */
        "batch-plan.view": {
            /** Format: uuid */
            workOrderId: string;
            externalRef: string;
            ordered: number;
            cavities: number;
            batchesPlanned: number;
            partsPlanned: number;
            partsRemaining: number;
            /** @description ceil(parts remaining ÷ cavities) */
            proposedBatches: number;
            /** @description The proposed bodies for POST /v1/batches (at most 200 listed) */
            batches: {
                /** Format: uuid */
                workOrderId: string;
                /** Format: uuid */
                moldId: string;
                /** Format: uuid */
                materialSystemId: string;
                options: components["schemas"]["batch-options"];
            }[];
        };
        /** What a batch still needs before release */
        "batch-release-check.view": {
            /** Format: uuid */
            batchId: string;
            state: string;
            /** @description True when the release button may be pressed */
            ready: boolean;
            /** @description What this batch must have recorded: A, B, the pigment when weighed separately, and what its system asks for */
            required: components["schemas"]["batch-release-check.view.item"][];
            missing: {
                item: components["schemas"]["batch-release-check.view.item"];
                /** @enum {unknown} */
                problem: "not_recorded" | "rejected" | "pending";
                message: string;
            }[];
            /** @description Rejected readings not waived (upheld ones included) */
            openRejections: number;
            /** @description The latest settled, judged mass of each part (null: not weighed), and the A:B ratio error they make against the batch's targets */
            weighed: {
                partA: components["schemas"]["batch-release-check.view.weighedMass"];
                partB: components["schemas"]["batch-release-check.view.weighedMass"];
                pigment: components["schemas"]["batch-release-check.view.weighedMass"];
                mixed: components["schemas"]["batch-release-check.view.weighedMass"];
                /** @description e = (m_A / m_B) ÷ (t_A / t_B) − 1, percent; null until both parts are weighed above zero */
                ratioErrorPercent: number | null;
            };
            readings: {
                total: number;
                rejected: number;
            };
        };
        /** @enum {unknown} */
        "batch-release-check.view.item": "part_a" | "part_b" | "pigment" | "component_temperature" | "mold_temperature" | "ambient_temperature" | "humidity" | "mix_start" | "pour" | "demold";
        "batch-release-check.view.weighedMass": {
            massKg: number;
            /** Format: uuid */
            readingId: string;
            /** Format: date-time */
            receivedAt: string;
        } | null;
        /** The targets stored with a batch */
        "batch-targets.view": {
            /** Format: uuid */
            batchId: string;
            /** @enum {unknown} */
            state: "planned" | "weighing" | "mixed" | "curing" | "on_hold" | "released" | "scrapped";
            /** Format: date-time */
            computedAt: string;
        } & components["schemas"]["targets.figures"];
        /** One move of a batch from one state to another */
        "batch-transition.view": {
            id: number;
            /** Format: uuid */
            batchId: string;
            /** @enum {unknown} */
            from: "planned" | "weighing" | "mixed" | "curing" | "on_hold" | "released" | "scrapped" | null;
            /** @enum {unknown} */
            to: "planned" | "weighing" | "mixed" | "curing" | "on_hold" | "released" | "scrapped";
            /** Format: date-time */
            at: string;
            /**
             * @example user
             * @example api_key
             * @example system
             */
            actorType: string;
            actor: string | null;
            reason: string | null;
        };
        /** Something to check before pouring */
        "batch-warning": {
            code: components["schemas"]["finding-code"];
            /** @enum {unknown} */
            severity: "caution" | "warning" | "danger";
            message: string;
            /** @description SI (see unit) */
            measured?: number;
            /** @description SI (see unit) */
            limit?: number;
            /** @description SI unit of measured and limit: kg, degC, 1, %, d */
            unit?: string;
            /** @description measured and limit in the caller’s units (for SI quantities) */
            display?: {
                measured: number | null;
                limit: number | null;
                unit: string;
            };
            /** @description What the sentence needs besides the figures */
            facts?: Record<string, never>;
        };
        /**
         * Plan a batch (one mix) and compute its targets
         * @description From a work order (its mold and material system are used unless given) or ad hoc. Give a moldId, or freeRiseCup for a cup test.
         */
        "batch.create": {
            /** Format: uuid */
            workOrderId?: string | null;
            /** Format: uuid */
            materialSystemId?: string;
            /** @description The system's current revision when not given */
            materialSystemRevision?: number;
            /** Format: uuid */
            moldId?: string;
            freeRiseCup?: {
                volume: components["schemas"]["quantity"];
            };
            stationCode?: string | null;
            options?: components["schemas"]["batch-options"];
            notes?: string | null;
            /** @description An engineer or admin lets an expired (past expiry or shelf life after opening), held or recalled lot into this batch; audited. Without it such a lot is a 409. */
            lotOverride?: {
                reason: string;
            };
        };
        /** A batch (one mix) with a summary of its targets in kg */
        "batch.view": {
            /** Format: uuid */
            id: string;
            /** @enum {unknown} */
            state: "planned" | "weighing" | "mixed" | "curing" | "on_hold" | "released" | "scrapped";
            /** Format: uuid */
            workOrderId: string | null;
            workOrderExternalRef: string | null;
            /** Format: uuid */
            materialSystemId: string;
            materialSystemName: string;
            materialSystemRevision: number;
            /** Format: uuid */
            materialSystemRevisionId: string;
            /** @enum {unknown} */
            subject: "mold" | "free_rise_cup";
            /** Format: uuid */
            moldId: string | null;
            moldName: string | null;
            /** Format: uuid */
            scaleDeviceId: string | null;
            stationCode: string | null;
            lots: {
                /** @enum {unknown} */
                part: "A" | "B" | "pigment";
                /** Format: uuid */
                id: string;
                lotNumber: string;
                /** Format: date */
                expiresOn: string;
            }[];
            /** Format: date */
            plannedFor: string;
            notes: string | null;
            /** @description The options as given when the batch was planned */
            options: components["schemas"]["batch-options"];
            computationVersion: string;
            summary: {
                targetDensityKgM3: number;
                packFactor: number;
                foamMassKg: number;
                mixedMassKg: number;
                massAKg: number;
                massBKg: number;
                pigmentMassKg: number;
                totalMassKg: number;
                /** @description Warning codes; the targets carry the full warnings */
                warnings: string[];
            };
            targetsHref: string;
            cautions: components["schemas"]["caution"][];
            createdBy: string | null;
            /** Format: date-time */
            createdAt: string;
            /** Format: date-time */
            updatedAt: string;
            /** @description An engineer let expired, held or recalled lots in: why, who, when, which */
            lotOverride: {
                reason: string;
                by: string;
                /** Format: date-time */
                at: string;
                lots: {
                    /** Format: uuid */
                    id: string;
                    lotNumber: string;
                    /** @enum {unknown} */
                    part: "A" | "B" | "pigment";
                    /** @enum {unknown} */
                    code: "lot_expired" | "lot_on_hold" | "lot_recalled";
                }[];
            } | null;
        };
        /** A caution shown with every target: read the SDS first */
        caution: {
            /**
             * @example ISOCYANATE_SENSITISER
             * @example EXOTHERM
             */
            code: string;
            text: string;
        };
        /** One material line of a work order's consumption: a part (A, B, pigment) from one lot */
        "consumption-material": {
            /** @enum {unknown} */
            part: "A" | "B" | "pigment";
            /** Format: uuid */
            lotId: string | null;
            lotNumber: string | null;
            batches: number;
            /** @description Sum of the batches' targets */
            plannedKg: number;
            /** @description Sum of the latest accepted (or waived) settled mass reading of the part in each batch */
            actualKg: number;
            /** @description actual − planned */
            varianceKg: number;
        };
        /**
         * Consumption and yield of a work order
         * @description Planned: the batches' stored targets; actual: the latest accepted (or waived) settled mass reading of each part in each batch. Parts: recorded parts by their disposition, or the mold's cavities for a disposed batch with none recorded.
         */
        "consumption.view": {
            /** Format: uuid */
            workOrderId: string;
            externalRef: string;
            partNumber: string | null;
            state: string;
            ordered: number;
            batches: number;
            parts: {
                accepted: number;
                rework: number;
                scrap: number;
                undecided: number;
            };
            /** @description accepted ÷ (accepted + rework + scrap) */
            yield: number | null;
            scrapMassKg: number;
            materials: components["schemas"]["consumption-material"][];
        };
        /** A control chart’s points, limits, signals and capability */
        "control-chart-data.view": {
            chart: components["schemas"]["control-chart.view"];
            /** @enum {unknown} */
            limitsKind: "frozen" | "trial";
            limits: null | {
                centre: number;
                mrBar: number;
                sigma: number;
                ucl: number;
                lcl: number;
                mrUcl: number;
                zones: {
                    oneSigma: number[];
                    twoSigma: number[];
                };
            };
            points: {
                id: string;
                value: number;
                movingRange: number | null;
                /** Format: date-time */
                at: string;
                /** Format: uuid */
                readingId: string | null;
                /** Format: uuid */
                batchId: string | null;
                /** Format: uuid */
                cupTestId: string | null;
                signals: {
                    /** Format: uuid */
                    id: string;
                    /** @enum {unknown} */
                    rule: "WE1" | "WE2" | "WE3" | "WE4" | "N1" | "N2" | "N3" | "N4" | "N5" | "N6" | "N7" | "N8";
                    acknowledged: boolean;
                }[];
            }[];
            summary: {
                n: number;
                mean: number | null;
                mrBar: number | null;
                sdOverall: number | null;
            };
            specification: {
                lsl: number | null;
                usl: number | null;
            };
            capability: null | {
                n: number;
                mean: number;
                sigmaWithin: number;
                sigmaOverall: number | null;
                cp: number | null;
                cpk: number | null;
                pp: number | null;
                ppk: number | null;
                warnings: string[];
            };
            warnings: string[];
        };
        /**
         * Freeze a chart’s limits
         * @description Either firstN, or from and to. The baseline must hold at least 20 points, and at least as many as the longest pattern of the chart’s rules.
         */
        "control-chart.baseline": {
            /** @description the first N points of the chart */
            firstN?: number;
            /**
             * Format: date-time
             * @description or the points of a period: at or after from
             */
            from?: string;
            /**
             * Format: date-time
             * @description and before to
             */
            to?: string;
        };
        /**
         * Define a control chart
         * @description At most one of stationId, deviceId, lotId narrows the chart. Rules default to WE1–WE4.
         */
        "control-chart.create": {
            name?: string;
            /** Format: uuid */
            materialSystemId: string;
            /** @enum {unknown} */
            metric: "ratio_error_percent" | "shot_mass_error_percent" | "component_temperature_a_c" | "component_temperature_b_c" | "free_rise_density_kg_m3";
            /** Format: uuid */
            stationId?: string | null;
            /** Format: uuid */
            deviceId?: string | null;
            /** Format: uuid */
            lotId?: string | null;
            /** @description WE1–WE4: Western Electric (1956); N1–N8: Nelson (1984) */
            rules?: ("WE1" | "WE2" | "WE3" | "WE4" | "N1" | "N2" | "N3" | "N4" | "N5" | "N6" | "N7" | "N8")[];
        };
        /** Rename a control chart or change its rules */
        "control-chart.update": {
            name?: string;
            /** @description WE1–WE4: Western Electric (1956); N1–N8: Nelson (1984) */
            rules?: ("WE1" | "WE2" | "WE3" | "WE4" | "N1" | "N2" | "N3" | "N4" | "N5" | "N6" | "N7" | "N8")[];
        };
        /** A control chart */
        "control-chart.view": {
            /** Format: uuid */
            id: string;
            name: string;
            /** Format: uuid */
            materialSystemId: string;
            /** @enum {unknown} */
            metric: "ratio_error_percent" | "shot_mass_error_percent" | "component_temperature_a_c" | "component_temperature_b_c" | "free_rise_density_kg_m3";
            metricLabel: string;
            unit: string;
            /** Format: uuid */
            stationId: string | null;
            /** Format: uuid */
            deviceId: string | null;
            /** Format: uuid */
            lotId: string | null;
            rules: ("WE1" | "WE2" | "WE3" | "WE4" | "N1" | "N2" | "N3" | "N4" | "N5" | "N6" | "N7" | "N8")[];
            /**
             * @description trial: no baseline frozen yet, limits move with the data and no signals are raised
             * @enum {unknown}
             */
            limitsKind: "frozen" | "trial";
            baseline: null | {
                centre: number;
                mrBar: number;
                sigma: number;
                ucl: number;
                lcl: number;
                mrUcl: number;
                zones: {
                    oneSigma: number[];
                    twoSigma: number[];
                };
                /** @enum {unknown} */
                method: "first_n" | "period";
                firstN: number | null;
                /** Format: date-time */
                from: string | null;
                /** Format: date-time */
                to: string | null;
                n: number;
                sdOverall: number | null;
                /** Format: date-time */
                firstPointAt: string;
                /** Format: date-time */
                lastPointAt: string;
                /** Format: date-time */
                frozenAt: string;
                frozenBy: string | null;
            };
            /** Format: date-time */
            createdAt: string;
            createdBy: string | null;
        };
        /** Acknowledge a run-rule signal */
        "control-signal.acknowledge": {
            note: string;
        };
        /** A run-rule signal */
        "control-signal.view": {
            /** Format: uuid */
            id: string;
            /** Format: uuid */
            chartId: string;
            chartName: string;
            /** Format: uuid */
            materialSystemId: string;
            /** @enum {unknown} */
            metric: "ratio_error_percent" | "shot_mass_error_percent" | "component_temperature_a_c" | "component_temperature_b_c" | "free_rise_density_kg_m3";
            /** @enum {unknown} */
            rule: "WE1" | "WE2" | "WE3" | "WE4" | "N1" | "N2" | "N3" | "N4" | "N5" | "N6" | "N7" | "N8";
            ruleDescription: string;
            value: number;
            /** Format: uuid */
            readingId: string | null;
            /** Format: uuid */
            batchId: string | null;
            /** @description the points of the pattern, oldest first; the last one raised the signal */
            points: {
                id: string;
                value: number;
                /** Format: date-time */
                at: string;
                /** Format: uuid */
                readingId: string | null;
                /** Format: uuid */
                batchId: string | null;
            }[];
            /** Format: date-time */
            raisedAt: string;
            acknowledged: boolean;
            acknowledgement: null | {
                /** Format: date-time */
                at: string;
                by: string | null;
                note: string | null;
            };
        };
        /** Add a defect cause to the organization's list */
        "defect-cause.create": {
            /** @description Short stable code (voids, short_fill, ...) */
            code: string;
            name: string;
            description?: string | null;
        };
        /** Change a defect cause (its code stays) */
        "defect-cause.update": {
            name?: string;
            description?: string | null;
            /** @description false: no longer offered for new dispositions (past ones keep it) */
            active?: boolean;
        };
        /** A defect cause of the organization's list */
        "defect-cause.view": {
            /** Format: uuid */
            id: string;
            code: string;
            name: string;
            description: string | null;
            active: boolean;
            /** Format: date-time */
            createdAt: string;
            /** Format: date-time */
            updatedAt: string;
        };
        /** Register a device */
        "device.create": {
            /** @enum {unknown} */
            kind: "scale" | "thermometer" | "hygrometer" | "logger" | "gateway";
            serial: string;
            name: string;
            /** @description The station the device sits at; created on first use */
            stationCode?: string | null;
            /** @description Scales: the scale division d (mass) */
            readability?: components["schemas"]["quantity"];
            /** @description Scales: maximum capacity (mass) */
            capacity?: components["schemas"]["quantity"];
            /** Format: date */
            calibrationDue?: string | null;
            retired?: boolean;
        };
        /**
         * Change a device
         * @description PUT sends the whole record; read-only fields (id, kind, createdAt, ...) are accepted and ignored.
         */
        "device.update": {
            serial?: string;
            name?: string;
            stationCode?: string | null;
            readability?: components["schemas"]["quantity"] | null;
            capacity?: components["schemas"]["quantity"] | null;
            /** Format: date */
            calibrationDue?: string | null;
            retired?: boolean;
        };
        /** A device: scale, thermometer, hygrometer, logger or gateway */
        "device.view": {
            /** Format: uuid */
            id: string;
            /** @enum {unknown} */
            kind: "scale" | "thermometer" | "hygrometer" | "logger" | "gateway";
            serial: string;
            name: string;
            station: {
                /** Format: uuid */
                id: string;
                code: string | null;
                name: string | null;
            } | null;
            stationCode: string | null;
            /** @description Scales: the division d, kg */
            readabilityKg: number | null;
            capacityKg: number | null;
            /** Format: date */
            calibrationDue: string | null;
            calibrationOverdue: boolean;
            retired: boolean;
            /** Format: date-time */
            createdAt: string;
            /** Format: date-time */
            updatedAt: string;
        };
        /** A quantity in the caller’s unit system, with the SI value alongside */
        "displayed-quantity": {
            value: number;
            unit: string;
            si: {
                value: number;
                unit: string;
            };
        };
        /** An SDS or TDS on file for a material system */
        "document.view": {
            /** Format: uuid */
            id: string;
            /** Format: uuid */
            materialSystemId: string;
            /** @enum {unknown} */
            kind: "SDS" | "TDS";
            title: string | null;
            fileName: string;
            contentType: string;
            sizeBytes: number;
            sha256: string;
            /** @description Download (application/pdf) */
            href: string;
            uploadedBy: string | null;
            /** Format: date-time */
            createdAt: string;
        };
        /**
         * The data of a batch.created event
         * @description A batch was planned and its targets computed
         */
        "event.batch.created": {
            /** Format: uuid */
            batchId: string;
            /** Format: uuid */
            workOrderId: string | null;
            /** Format: uuid */
            materialSystemId: string;
            /** @enum {unknown} */
            subject: "mold" | "free_rise_cup";
            totalMassKg: number;
            /** @constant */
            state: "planned";
        };
        /**
         * The data of a batch.disposed event
         * @description A batch's parts were judged after demold: accepted, rework or scrap, with defect causes
         */
        "event.batch.disposed": {
            /** Format: uuid */
            batchId: string;
            /** Format: uuid */
            workOrderId: string | null;
            /** @enum {unknown} */
            decision: "accepted" | "rework" | "scrap";
            /** @description Codes of the organization's defect causes */
            defectCauses: string[];
            parts: {
                accepted: number;
                rework: number;
                scrap: number;
            };
            note: string | null;
        };
        /**
         * The data of a batch.on_hold event
         * @description A batch was put on hold pending review
         */
        "event.batch.on_hold": {
            /** Format: uuid */
            batchId: string;
            /** @enum {unknown} */
            from: "planned" | "weighing" | "mixed" | "curing" | "on_hold" | "released" | "scrapped";
            /** @enum {unknown} */
            to: "planned" | "weighing" | "mixed" | "curing" | "on_hold" | "released" | "scrapped";
            reason: string;
        };
        /**
         * The data of a batch.released event
         * @description A batch was released: every rejection waived or none
         */
        "event.batch.released": {
            /** Format: uuid */
            batchId: string;
            /** @enum {unknown} */
            from: "planned" | "weighing" | "mixed" | "curing" | "on_hold" | "released" | "scrapped";
            /** @enum {unknown} */
            to: "planned" | "weighing" | "mixed" | "curing" | "on_hold" | "released" | "scrapped";
            reason: string;
        };
        /**
         * The data of a batch.scrapped event
         * @description A batch was scrapped
         */
        "event.batch.scrapped": {
            /** Format: uuid */
            batchId: string;
            /** @enum {unknown} */
            from: "planned" | "weighing" | "mixed" | "curing" | "on_hold" | "released" | "scrapped";
            /** @enum {unknown} */
            to: "planned" | "weighing" | "mixed" | "curing" | "on_hold" | "released" | "scrapped";
            reason: string;
        };
        /**
         * The data of a batch.state_changed event
         * @description A batch moved from one state to another
         */
        "event.batch.state_changed": {
            /** Format: uuid */
            batchId: string;
            /** @enum {unknown} */
            from: "planned" | "weighing" | "mixed" | "curing" | "on_hold" | "released" | "scrapped";
            /** @enum {unknown} */
            to: "planned" | "weighing" | "mixed" | "curing" | "on_hold" | "released" | "scrapped";
            reason: string;
        };
        /**
         * The data of a drift.acknowledged event
         * @description An engineer acknowledged a drift signal with a note
         */
        "event.drift.acknowledged": {
            /** Format: uuid */
            signalId: string;
            /** Format: uuid */
            chartId: string;
            /** Format: uuid */
            materialSystemId: string;
            /** @enum {unknown} */
            metric: "ratio_error_percent" | "shot_mass_error_percent" | "component_temperature_a_c" | "component_temperature_b_c" | "free_rise_density_kg_m3";
            /** @enum {unknown} */
            rule: "WE1" | "WE2" | "WE3" | "WE4" | "N1" | "N2" | "N3" | "N4" | "N5" | "N6" | "N7" | "N8";
            note: string;
            acknowledgedBy: string | null;
        };
        /**
         * The data of a drift.detected event
         * @description A run rule of a control chart fired on a new value: the process is moving before readings leave tolerance
         */
        "event.drift.detected": {
            /** Format: uuid */
            signalId: string;
            /** Format: uuid */
            chartId: string;
            chartName: string;
            /** Format: uuid */
            materialSystemId: string;
            /** @enum {unknown} */
            metric: "ratio_error_percent" | "shot_mass_error_percent" | "component_temperature_a_c" | "component_temperature_b_c" | "free_rise_density_kg_m3";
            /** @enum {unknown} */
            rule: "WE1" | "WE2" | "WE3" | "WE4" | "N1" | "N2" | "N3" | "N4" | "N5" | "N6" | "N7" | "N8";
            ruleDescription: string;
            /** Format: uuid */
            readingId: string | null;
            /** Format: uuid */
            batchId: string | null;
            value: number;
            centre: number;
            ucl: number;
            lcl: number;
        };
        /** Event feed query */
        "event.feed-query": {
            /** @description The next cursor of the previous page; omit for the oldest events */
            after?: string;
            /** @default 100 */
            limit?: number;
            /** @description Only these event types (repeat the parameter) */
            type?: ("webhook.test" | "reading.accepted" | "reading.rejected" | "reading.waived" | "reading.upheld" | "batch.created" | "batch.state_changed" | "batch.released" | "batch.on_hold" | "batch.scrapped" | "lot.held" | "lot.hold_released" | "work_order.created" | "work_order.changed" | "drift.detected" | "drift.acknowledged")[];
        };
        /** A page of the event feed */
        "event.feed": {
            events: components["schemas"]["event"][];
            /** @description Pass as after= for the next page (also when empty: poll again later with it) */
            next: string | null;
            hasMore: boolean;
        };
        /**
         * The data of a lot.held event
         * @description A lot was put on hold for new batches: a cup test of it failed (ASTM D7487 terms)
         */
        "event.lot.held": {
            /** Format: uuid */
            lotId: string;
            lotNumber: string;
            /** @enum {unknown} */
            part: "A" | "B" | "pigment";
            /** Format: uuid */
            cupTestId: string;
            /** @description The codes of the cup test's failed checks */
            reasons: components["schemas"]["finding-code"][];
        };
        /**
         * The data of a lot.hold_released event
         * @description An engineer released a held lot, with a note saying why
         */
        "event.lot.hold_released": {
            /** Format: uuid */
            lotId: string;
            lotNumber: string;
            /** @enum {unknown} */
            part: "A" | "B" | "pigment";
            /**
             * Format: uuid
             * @description The cup test that held it
             */
            cupTestId: string | null;
            note: string;
            releasedBy: string | null;
        };
        /**
         * The data of a lot.recalled event
         * @description A lot was recalled: it goes into no new batch; GET /v1/lots/{id}/recall lists every batch, work order and part it went into
         */
        "event.lot.recalled": {
            /** Format: uuid */
            lotId: string;
            lotNumber: string;
            /** @enum {unknown} */
            part: "A" | "B" | "pigment";
            reason: string;
            recalledBy: string;
            affectedBatches: number;
            affectedWorkOrders: number;
        };
        /**
         * The data of a reading.accepted event
         * @description A reading was judged within every tolerance
         */
        "event.reading.accepted": {
            /** Format: uuid */
            readingId: string;
            /** Format: uuid */
            batchId: string;
            /** Format: uuid */
            deviceId: string;
            /** @enum {unknown} */
            quantity: "mass" | "temperature" | "humidity" | "milestone";
            /** @enum {unknown} */
            subject: "part_a" | "part_b" | "pigment" | "mixed" | "mold" | "ambient" | "mix_start" | "pour" | "demold";
            /** @constant */
            status: "accepted";
            reasons: components["schemas"]["reading.reason"][];
        };
        /**
         * The data of a reading.rejected event
         * @description A reading was judged outside a tolerance; the reasons say which and by how much
         */
        "event.reading.rejected": {
            /** Format: uuid */
            readingId: string;
            /** Format: uuid */
            batchId: string;
            /** Format: uuid */
            deviceId: string;
            /** @enum {unknown} */
            quantity: "mass" | "temperature" | "humidity" | "milestone";
            /** @enum {unknown} */
            subject: "part_a" | "part_b" | "pigment" | "mixed" | "mold" | "ambient" | "mix_start" | "pour" | "demold";
            /** @constant */
            status: "rejected";
            reasons: components["schemas"]["reading.reason"][];
        };
        /**
         * The data of a reading.upheld event
         * @description An engineer confirmed a rejection
         */
        "event.reading.upheld": {
            /** Format: uuid */
            readingId: string;
            /** Format: uuid */
            batchId: string;
            /** @constant */
            decision: "uphold";
            note: string | null;
            reviewedBy: string | null;
        };
        /**
         * The data of a reading.waived event
         * @description An engineer accepted a rejected reading anyway, with a note
         */
        "event.reading.waived": {
            /** Format: uuid */
            readingId: string;
            /** Format: uuid */
            batchId: string;
            /** @constant */
            decision: "waive";
            note: string | null;
            reviewedBy: string | null;
        };
        /**
         * An event: the body of every webhook and each item of the feed
         * @description The webhook-id header carries the same id on every retry: receivers de-duplicate on it.
         */
        event: {
            /** Format: uuid */
            id: string;
            /** @enum {unknown} */
            type: "webhook.test" | "reading.accepted" | "reading.rejected" | "reading.waived" | "reading.upheld" | "batch.created" | "batch.state_changed" | "batch.released" | "batch.on_hold" | "batch.scrapped" | "lot.held" | "lot.hold_released" | "work_order.created" | "work_order.changed" | "drift.detected" | "drift.acknowledged";
            /** Format: date-time */
            occurredAt: string;
            subject: {
                type: string;
                id: string;
            };
            /** @description Per type; see the event.<type> schemas */
            data: Record<string, never>;
        };
        /**
         * The data of a webhook.test event
         * @description A test event sent from POST /v1/webhook-endpoints/{id}/test
         */
        "event.webhook.test": {
            message: string;
            /** Format: uuid */
            endpointId: string;
        };
        /**
         * The data of a work_order.changed event
         * @description A work order was changed
         */
        "event.work_order.changed": {
            /** Format: uuid */
            workOrderId: string;
            externalRef: string;
            changed: string[];
        };
        /**
         * The data of a work_order.completed event
         * @description A work order was completed: what it consumed by lot (from accepted readings) and what it made, for the ERP to back-flush stock
         */
        "event.work_order.completed": {
            /** Format: uuid */
            workOrderId: string;
            externalRef: string;
            partNumber: string | null;
            parts: {
                ordered: number;
                accepted: number;
                rework: number;
                scrap: number;
            };
            yield: number | null;
            scrapMassKg: number;
            materials: components["schemas"]["consumption-material"][];
        };
        /**
         * The data of a work_order.created event
         * @description A work order arrived (from the ERP or an engineer)
         */
        "event.work_order.created": {
            /** Format: uuid */
            workOrderId: string;
            externalRef: string;
            quantity: number;
            state: string;
        };
        /**
         * A finding code
         * @description One vocabulary for batch warnings, reading reasons and cup-test verdicts: the same fact has the same code wherever it is found.
         * @enum {unknown}
         */
        "finding-code": "SCALE_NOT_STABLE" | "CALIBRATION_OVERDUE" | "OVER_CAPACITY" | "RATIO_ISOCYANATE_HEAVY" | "RATIO_POLYOL_HEAVY" | "PART_A_MASS_LOW" | "PART_A_MASS_HIGH" | "PART_B_MASS_LOW" | "PART_B_MASS_HIGH" | "PART_NOT_WEIGHED" | "SHORT_SHOT" | "TOTAL_MASS_LOW" | "TOTAL_MASS_HIGH" | "PIGMENT_MASS_LOW" | "PIGMENT_MASS_HIGH" | "PIGMENT_OVER_LIMIT" | "TEMPERATURE_BELOW_WINDOW" | "TEMPERATURE_ABOVE_WINDOW" | "MOLD_TEMPERATURE_BELOW_WINDOW" | "MOLD_TEMPERATURE_ABOVE_WINDOW" | "AMBIENT_TEMPERATURE_BELOW_WINDOW" | "AMBIENT_TEMPERATURE_ABOVE_WINDOW" | "HUMIDITY_ABOVE_LIMIT" | "POT_LIFE_EXCEEDED" | "DEMOLDED_EARLY" | "PACK_FACTOR_BELOW_ONE" | "PACK_FACTOR_MARGINAL" | "PACK_FACTOR_ABOVE_LIMIT" | "TOLERANCE_BELOW_SCALE_RESOLUTION" | "EXOTHERM_RISK_MASS" | "LOT_EXPIRED" | "CREAM_TIME_BELOW_WINDOW" | "CREAM_TIME_ABOVE_WINDOW" | "RISE_TIME_BELOW_WINDOW" | "RISE_TIME_ABOVE_WINDOW" | "TACK_FREE_TIME_BELOW_WINDOW" | "TACK_FREE_TIME_ABOVE_WINDOW" | "FREE_RISE_DENSITY_BELOW_BAND" | "FREE_RISE_DENSITY_ABOVE_BAND";
        /** The least-squares line of a system’s cup tests: free-rise density against component temperature */
        "free-rise-fit.view": {
            /** Format: uuid */
            materialSystemId: string;
            cupTests: number;
            temperatureBasis: string;
            /** @description Null below three cups or when all were at one temperature */
            fit: {
                slopeKgM3PerC: number;
                interceptKgM3: number;
                rSquared: number | null;
                residualStandardDeviationKgM3: number;
                count: number;
            } | null;
            /** @description Whether targets use this line (judged at the system's reference temperature) */
            trusted: boolean;
            /** @enum {unknown} */
            notTrustedBecause: "too_few_points" | "narrow_span" | "poor_fit" | "unexpected_sign" | "outside_tested_span" | null;
            trustRules: {
                minimumPoints: number;
                minimumSpanC: number;
                minimumRSquared: number;
                extrapolationMarginC: number;
                maxSlopeShare: number;
            };
        };
        /** Liveness: the process answers */
        "health.view": {
            /** @constant */
            status: "ok";
            /** Format: date-time */
            startedAt: string;
        };
        /** A logger CSV import (the fields every import view has) */
        "import.base": {
            /** Format: uuid */
            id: string;
            fileName: string | null;
            sha256: string;
            sizeBytes: number;
            /** @enum {unknown} */
            status: "queued" | "running" | "done" | "failed";
            /** @description Rows in the file */
            total: number;
            processed: number;
            percent: number;
            /** @description Readings stored */
            accepted: number;
            /** @description Rows whose reading was stored before */
            duplicates: number;
            rejectedRows: number;
            /** @description The first bad rows, with their line numbers */
            badRows: {
                line: number;
                errors: {
                    field: string;
                    detail: string;
                }[];
            }[];
            /** @description Why the whole file failed */
            error: string | null;
            uploadedBy: string | null;
            /** Format: date-time */
            createdAt: string;
            /** Format: date-time */
            startedAt: string | null;
            /** Format: date-time */
            finishedAt: string | null;
            statusUrl: string;
        };
        /** An uploaded import: new (202) or the first import of the same file (200, replayed) */
        "import.upload": {
            replayed: boolean;
        } & components["schemas"]["import.base"];
        /** A logger CSV import: status, progress and bad rows */
        "import.view": components["schemas"]["import.base"];
        /** Accept an invitation and set a password */
        "invitation.accept": {
            token: string;
            name: string;
            /** @description At least 10 characters */
            password: string;
        };
        /** The account an accepted invitation created, and its first session (the person is signed in) */
        "invitation.accepted": {
            email: string;
            /** @enum {unknown} */
            role: "admin" | "engineer" | "integrator" | "viewer";
            session: components["schemas"]["auth.session"];
        };
        /** Invite a person */
        "invitation.create": {
            /** Format: email */
            email: string;
            /** @enum {unknown} */
            role: "admin" | "engineer" | "integrator" | "viewer";
            /** @description Optional; the person can change it when accepting */
            name?: string;
        };
        /**
         * Look up an invitation by the token of its link
         * @description Sent in a body rather than the URL, so the token stays out of access logs.
         */
        "invitation.lookup": {
            token: string;
        };
        /** What an invitation link offers, for the acceptance page */
        "invitation.preview": {
            organization: {
                name: string;
            };
            /** @enum {unknown} */
            role: "admin" | "engineer" | "integrator" | "viewer";
            /** @description The address invited: the account's sign-in e-mail */
            email: string;
            /** @description The name the admin typed, to prefill; null when none was given */
            name: string | null;
            /** @description Who sent the invitation (their name) */
            invitedBy: string | null;
            /** Format: date-time */
            expiresAt: string;
        };
        /** An invitation sent by e-mail */
        "invitation.view": {
            /** Format: uuid */
            id: string;
            email: string;
            /** @enum {unknown} */
            role: "admin" | "engineer" | "integrator" | "viewer";
            invitedBy: {
                /** Format: uuid */
                id: string;
                name: string | null;
            } | null;
            /** Format: date-time */
            expiresAt: string;
            /** Format: date-time */
            acceptedAt: string | null;
            /** Format: date-time */
            revokedAt: string | null;
            /** Format: date-time */
            createdAt: string;
            /** @enum {unknown} */
            state: "pending" | "accepted" | "revoked" | "expired";
        };
        /** A device as the live stream names it */
        "live.device": {
            /** Format: uuid */
            id: string;
            name: string;
            stationCode: string | null;
        };
        /**
         * One message of the live station stream (the JSON of an SSE `data:` line)
         * @description SSE event names: `reading` (this payload) and `ready` (sent once when the stream opens: `{ "devices": [...] }`, the devices watched). `kind` says what happened: received (the scale posted it, verdict pending), judged (its verdict and reasons), reviewed (an engineer waived or upheld it).
         */
        "live.event": {
            /** @enum {unknown} */
            kind: "received" | "judged" | "reviewed";
            reading: components["schemas"]["reading.view"];
            device: components["schemas"]["live.device"];
        };
        /** The first message of a live stream (SSE event `ready`): the devices it watches */
        "live.ready": {
            devices: components["schemas"]["live.device"][];
        };
        /** What a live stream watches: one station, one device, or (neither) every device */
        "live.ticket.create": {
            /** Format: uuid */
            stationId?: string;
            /** Format: uuid */
            deviceId?: string;
        };
        /**
         * A short-lived ticket that opens one live stream
         * @description EventSource cannot send an Authorization header: an authenticated POST /v1/live/tickets hands out this ticket, and GET /v1/live/stream?ticket=… opens the stream with it. It names the person, the organization and what to watch, and expires after `expiresInSeconds`; a stream already open stays open. To reconnect, ask for a new ticket.
         */
        "live.ticket": {
            ticket: string;
            /** Format: date-time */
            expiresAt: string;
            expiresInSeconds: number;
            /** @description Path of the stream with the ticket, for new EventSource(streamUrl) */
            streamUrl: string;
        };
        /** Where a lot went: batches, work orders, parts */
        "lot-genealogy.view": {
            lot: components["schemas"]["lot.view"];
            batches: {
                /** Format: uuid */
                batchId: string;
                state: string;
                /** Format: date */
                plannedFor: string;
                /** Format: uuid */
                workOrderId: string | null;
                workOrderExternalRef: string | null;
                moldName: string | null;
                stationCode: string | null;
                /** @enum {unknown} */
                disposition: "accepted" | "rework" | "scrap" | null;
                parts: {
                    accepted: number;
                    rework: number;
                    scrap: number;
                    undecided: number;
                };
                lots: {
                    /** @enum {unknown} */
                    part: "A" | "B" | "pigment";
                    /** Format: uuid */
                    id: string;
                    lotNumber: string;
                }[];
            }[];
            workOrders: {
                /** Format: uuid */
                id: string;
                externalRef: string;
                partNumber: string | null;
                state: string;
                batches: number;
            }[];
            parts: {
                accepted: number;
                rework: number;
                scrap: number;
                undecided: number;
            };
        };
        /** Record (POST) or change (PUT) a component lot */
        "lot.create": {
            /** @enum {unknown} */
            part: "A" | "B" | "pigment";
            /**
             * Format: uuid
             * @description Required for parts A and B; a pigment may serve several systems
             */
            materialSystemId?: string | null;
            /** @description The supplier's lot (batch) number as printed on the drum */
            lotNumber: string;
            /** Format: date */
            receivedOn: string;
            /**
             * Format: date
             * @description Last day the lot may be used
             */
            expiresOn: string;
            /**
             * Format: date
             * @description The day the drum was first opened
             */
            openedOn?: string | null;
            /** @description Days the lot stays usable once opened (the supplier's data sheet); usable until its expiry when not given */
            shelfLifeDaysAfterOpening?: number | null;
            notes?: string | null;
        };
        /** Recall a lot */
        "lot.recall": {
            reason: string;
        };
        /** Release a lot held by a failed cup test */
        "lot.release-hold": {
            /** @description Why the lot may be used again (e.g. a repeat cup test passed, the supplier confirmed the lot) */
            note: string;
        };
        /** A lot of part A, part B or pigment */
        "lot.view": {
            /** Format: uuid */
            id: string;
            /** @enum {unknown} */
            part: "A" | "B" | "pigment";
            /** Format: uuid */
            materialSystemId: string | null;
            materialSystemName: string | null;
            lotNumber: string;
            /** Format: date */
            receivedOn: string;
            /** Format: date */
            expiresOn: string;
            /** Format: date */
            openedOn: string | null;
            /** @description Past its usable-until day before today (UTC) */
            expired: boolean;
            notes: string | null;
            /** Format: date-time */
            createdAt: string;
            /** Format: date-time */
            updatedAt: string;
            /** @description Held for new batches: its latest cup test failed and no engineer has released it */
            hold: {
                /** Format: date-time */
                since: string;
                /** Format: uuid */
                cupTestId: string | null;
            } | null;
            lastHoldRelease: {
                /** Format: date-time */
                at: string;
                by: string | null;
                note: string | null;
            } | null;
            shelfLifeDaysAfterOpening: number | null;
            /**
             * Format: date
             * @description The last day the lot may be used: its expiry, or the opening day plus the shelf life after opening when earlier
             */
            usableUntil: string;
            /** @description Recalled: the lot goes into no new batch; GET /v1/lots/{id}/recall lists what it went into */
            recall: {
                /** Format: date-time */
                at: string;
                reason: string | null;
                by: string | null;
            } | null;
        };
        /** One revision of a material system (SI) */
        "material-system-revision.view": {
            /** Format: uuid */
            id: string;
            /** Format: uuid */
            materialSystemId: string;
            revision: number;
            /** @enum {unknown} */
            ratioBasis: "weight" | "volume";
            ratio: {
                a: number;
                b: number;
            };
            specificGravityA: number;
            specificGravityB: number;
            /** @enum {unknown} */
            isocyanatePart: "A" | "B";
            freeRiseDensityKgM3: number;
            freeRiseReferenceTemperatureC: number;
            freeRiseDensitySlopeKgM3PerC: number | null;
            ratioTolerancePercent: number;
            componentTemperatureMinC: number | null;
            componentTemperatureMaxC: number | null;
            moldTemperatureMinC: number | null;
            moldTemperatureMaxC: number | null;
            ambientTemperatureMinC: number | null;
            ambientTemperatureMaxC: number | null;
            maxRelativeHumidityPercent: number | null;
            massTolerancePercent: number | null;
            potLifeS: number | null;
            demoldTimeS: number | null;
            fullCureTimeS: number | null;
            maxPigmentPercent: number | null;
            maxPackFactor: number | null;
            exothermMassLimitKg: number | null;
            ncoPercent: number | null;
            hydroxylNumberMgKohG: number | null;
            waterPbw: number | null;
            cautionsText: string | null;
            /** @description Worked out from the parameters by the computation */
            derived: {
                weightRatio: {
                    a: number;
                    b: number;
                };
                volumeRatio: {
                    a: number;
                    b: number;
                };
                isocyanateIndex: number | null;
            };
            changeNote: string | null;
            createdBy: string | null;
            /** Format: date-time */
            createdAt: string;
            /** @description ± pbw of B per the system's A parts; replaces the percent when set */
            ratioTolerancePbw: number | null;
            /**
             * @description What a pigment percent is of
             * @enum {unknown}
             */
            pigmentDoseBasis: "ab" | "polyol" | "total";
            /**
             * @description Weighed on its own or pre-blended in a part
             * @enum {unknown}
             */
            pigmentPlacement: "separate" | "A" | "B";
            /** @description mg KOH/g, counted in the isocyanate index */
            pigmentCarrierHydroxylNumber: number | null;
            creamTimeMinS: number | null;
            creamTimeMaxS: number | null;
            riseTimeMinS: number | null;
            riseTimeMaxS: number | null;
            tackFreeTimeMinS: number | null;
            tackFreeTimeMaxS: number | null;
            freeRiseDensityMinKgM3: number | null;
            freeRiseDensityMaxKgM3: number | null;
            releaseRequires: ("component_temperature" | "mold_temperature" | "ambient_temperature" | "humidity" | "mix_start" | "pour" | "demold")[];
            /** @description The finished part's spec (SI); null where the system states none */
            partSpec: {
                densityTolerancePercent: number | null;
                coreDensityMinKgM3: number | null;
                coreDensityMaxKgM3: number | null;
                indentationForceMinN: number | null;
                indentationForceMaxN: number | null;
                /** @enum {unknown} */
                durometerScale: "A" | "OO" | "D" | null;
                durometerMin: number | null;
                durometerMax: number | null;
            };
        };
        /**
         * Define (POST) or revise (PUT) a material system
         * @description The whole system: a PUT that changes any parameter writes a new revision; batches keep the revision they were computed with.
         */
        "material-system.create": {
            name: unknown;
            kind: unknown;
        } & WithRequired<components["schemas"]["material-system.parameters"], "name" | "kind">;
        /**
         * A material system: a two-part polyurethane formulation
         * @description Everything the computation needs to know about a system, in any accepted shop units (stored in SI). Used whole by POST/PUT /v1/material-systems and as an inline system by POST /v1/targets/preview.
         */
        "material-system.parameters": {
            /** @example Demo Flex 28 */
            name?: string;
            /** @enum {unknown} */
            kind?: "flexible" | "integral-skin" | "other";
            /**
             * @description Whether the mix ratio is by weight or by volume
             * @enum {unknown}
             */
            ratioBasis: "weight" | "volume";
            /** @description Mix ratio A:B in parts, e.g. 100:45 */
            ratio: {
                a: number;
                b: number;
            };
            /** @description Specific gravity of part A (density relative to water) */
            specificGravityA: number;
            /** @description Specific gravity of part B */
            specificGravityB: number;
            /**
             * @description Which part is the isocyanate side
             * @enum {unknown}
             */
            isocyanatePart: "A" | "B";
            /** @description Free-rise density (density) at the reference component temperature */
            freeRiseDensity: components["schemas"]["quantity"];
            /** @description Component temperature (temperature) the free-rise density was measured at */
            freeRiseReferenceTemperature: components["schemas"]["quantity"];
            /** @description Change of free-rise density per degree of component temperature; unit written <density>/<temperature>, e.g. kg/m3/degC or lb/ft3/degF (usually negative) */
            freeRiseDensitySlope?: components["schemas"]["quantity"] | null;
            /**
             * @description ± tolerance on the A:B ratio, percent (5 when not given: common practice)
             * @default 5
             */
            ratioTolerancePercent?: number;
            /** @description Component temperatures the system is made for (temperature) */
            componentTemperatureWindow?: {
                min: components["schemas"]["quantity"];
                max: components["schemas"]["quantity"];
            } | null;
            /** @description Mold surface temperatures the system is made for (temperature) */
            moldTemperatureWindow?: {
                min: components["schemas"]["quantity"];
                max: components["schemas"]["quantity"];
            } | null;
            /** @description Shop air temperatures the system is made for (temperature) */
            ambientTemperatureWindow?: {
                min: components["schemas"]["quantity"];
                max: components["schemas"]["quantity"];
            } | null;
            /** @description Highest relative humidity of the shop air, percent (moisture reacts with the isocyanate side) */
            maxRelativeHumidity?: number | null;
            /** @description ± band on weighed masses (A, B, pigment, total) against their targets, percent; the ratio tolerance when not given */
            massTolerancePercent?: number | null;
            /** @description Working time from when A meets B (time) */
            potLife?: components["schemas"]["quantity"] | null;
            /** @description Time */
            demoldTime?: components["schemas"]["quantity"] | null;
            /** @description Time */
            fullCureTime?: components["schemas"]["quantity"] | null;
            /** @description Highest pigment, percent of the dose basis (A+B unless pigmentDoseBasis says otherwise) */
            maxPigmentPercent?: number | null;
            /** @description Highest pack factor the system is made for (at least 1) */
            maxPackFactor?: number | null;
            /** @description Largest single pour the supplier allows for exotherm (mass); 2 kg when not given */
            exothermMassLimit?: components["schemas"]["quantity"] | null;
            /** @description %NCO of the isocyanate side */
            ncoPercent?: number | null;
            /** @description OH number of the polyol side as supplied, mg KOH/g */
            hydroxylNumber?: number | null;
            /** @description Water in the polyol side, parts per 100 parts of the polyol side */
            waterPbw?: number | null;
            /** @description The system's own cautions, returned after the standard ones */
            cautionsText?: string | null;
            /** @description Why this revision was made (PUT) */
            changeNote?: string | null;
            /** @description ± tolerance as data sheets state it: parts by weight of B per the system's A parts (100 : 45 ± 2 is 2). Replaces ratioTolerancePercent; weight ratios only */
            ratioTolerancePbw?: number | null;
            /**
             * @description What a pigment percent is of: A+B, the polyol side, or the total with the pigment (pastes are dosed all three ways)
             * @default ab
             * @enum {unknown}
             */
            pigmentDoseBasis?: "ab" | "polyol" | "total";
            /**
             * @description Pigment weighed on its own, or pre-blended in part A or B (that part's target and the ratio check then include it)
             * @default separate
             * @enum {unknown}
             */
            pigmentPlacement?: "separate" | "A" | "B";
            /** @description OH number of the pigment paste's carrier, mg KOH/g: counted in the isocyanate index */
            pigmentCarrierHydroxylNumber?: number | null;
            /** @description Cup-test cream time window (time), ASTM D7487 terms */
            creamTimeWindow?: {
                min: components["schemas"]["quantity"];
                max: components["schemas"]["quantity"];
            } | null;
            /** @description Cup-test rise (top-of-cup) time window (time), ASTM D7487 terms */
            riseTimeWindow?: {
                min: components["schemas"]["quantity"];
                max: components["schemas"]["quantity"];
            } | null;
            /** @description Cup-test tack-free time window (time), ASTM D7487 terms */
            tackFreeTimeWindow?: {
                min: components["schemas"]["quantity"];
                max: components["schemas"]["quantity"];
            } | null;
            /** @description Free-rise density band at the reference temperature (density) for judging cup tests; a cup's density is corrected to the reference temperature with the system's slope */
            freeRiseDensityBand?: {
                min: components["schemas"]["quantity"];
                max: components["schemas"]["quantity"];
            } | null;
            /** @description What a batch must also have recorded (and accepted or waived) before release, besides A, B and the pigment */
            releaseRequires?: ("component_temperature" | "mold_temperature" | "ambient_temperature" | "humidity" | "mix_start" | "pour" | "demold")[];
            /** @description ± band on a finished part's molded density (mass ÷ cavity volume) against the batch's target density, percent; 10 when not given (common practice) */
            partDensityTolerancePercent?: number | null;
            /** @description Core density of a test specimen (density), ASTM D3574 Test A / ISO 845 */
            coreDensityBand?: {
                min: components["schemas"]["quantity"];
                max: components["schemas"]["quantity"];
            } | null;
            /** @description Indentation force deflection at 25 % (N or lbf), ASTM D3574 Test B1: flexible foams */
            indentationForceBand?: {
                min: {
                    value: number;
                    /** @enum {unknown} */
                    unit: "N" | "lbf";
                };
                max: {
                    value: number;
                    /** @enum {unknown} */
                    unit: "N" | "lbf";
                };
            } | null;
            /** @description Durometer hardness band (ASTM D2240): integral-skin parts */
            durometerBand?: {
                /** @enum {unknown} */
                scale: "A" | "OO" | "D";
                min: number;
                max: number;
            } | null;
        };
        /** A material system at its current revision (SI) */
        "material-system.view": {
            /** Format: uuid */
            id: string;
            name: string;
            /** @enum {unknown} */
            kind: "flexible" | "integral-skin" | "other";
            revision: number;
            /** Format: uuid */
            revisionId: string;
            /** Format: date-time */
            revisedAt: string;
            /** @enum {unknown} */
            ratioBasis: "weight" | "volume";
            ratio: {
                a: number;
                b: number;
            };
            specificGravityA: number;
            specificGravityB: number;
            /** @enum {unknown} */
            isocyanatePart: "A" | "B";
            freeRiseDensityKgM3: number;
            freeRiseReferenceTemperatureC: number;
            freeRiseDensitySlopeKgM3PerC: number | null;
            ratioTolerancePercent: number;
            componentTemperatureMinC: number | null;
            componentTemperatureMaxC: number | null;
            moldTemperatureMinC: number | null;
            moldTemperatureMaxC: number | null;
            ambientTemperatureMinC: number | null;
            ambientTemperatureMaxC: number | null;
            maxRelativeHumidityPercent: number | null;
            massTolerancePercent: number | null;
            potLifeS: number | null;
            demoldTimeS: number | null;
            fullCureTimeS: number | null;
            maxPigmentPercent: number | null;
            maxPackFactor: number | null;
            exothermMassLimitKg: number | null;
            ncoPercent: number | null;
            hydroxylNumberMgKohG: number | null;
            waterPbw: number | null;
            cautionsText: string | null;
            /** @description Worked out from the parameters by the computation */
            derived: {
                weightRatio: {
                    a: number;
                    b: number;
                };
                volumeRatio: {
                    a: number;
                    b: number;
                };
                isocyanateIndex: number | null;
            };
            /** @description How many documents of each kind are on file */
            documents: {
                sds: number;
                tds: number;
            };
            /** Format: date-time */
            createdAt: string;
            /** Format: date-time */
            updatedAt: string;
            /** @description ± pbw of B per the system's A parts; replaces the percent when set */
            ratioTolerancePbw: number | null;
            /**
             * @description What a pigment percent is of
             * @enum {unknown}
             */
            pigmentDoseBasis: "ab" | "polyol" | "total";
            /**
             * @description Weighed on its own or pre-blended in a part
             * @enum {unknown}
             */
            pigmentPlacement: "separate" | "A" | "B";
            /** @description mg KOH/g, counted in the isocyanate index */
            pigmentCarrierHydroxylNumber: number | null;
            creamTimeMinS: number | null;
            creamTimeMaxS: number | null;
            riseTimeMinS: number | null;
            riseTimeMaxS: number | null;
            tackFreeTimeMinS: number | null;
            tackFreeTimeMaxS: number | null;
            freeRiseDensityMinKgM3: number | null;
            freeRiseDensityMaxKgM3: number | null;
            releaseRequires: ("component_temperature" | "mold_temperature" | "ambient_temperature" | "humidity" | "mix_start" | "pour" | "demold")[];
            /** @description The finished part's spec (SI); null where the system states none */
            partSpec: {
                densityTolerancePercent: number | null;
                coreDensityMinKgM3: number | null;
                coreDensityMaxKgM3: number | null;
                indentationForceMinN: number | null;
                indentationForceMaxN: number | null;
                /** @enum {unknown} */
                durometerScale: "A" | "OO" | "D" | null;
                durometerMin: number | null;
                durometerMax: number | null;
            };
        };
        /** The signed-in person */
        me: {
            /** Format: uuid */
            id: string;
            email: string;
            name: string;
            /** @enum {unknown} */
            role: "admin" | "engineer" | "integrator" | "viewer";
            /** @enum {unknown} */
            unitSystem: "metric" | "imperial";
            /** @enum {unknown} */
            notifyRejections?: "each" | "digest" | "off";
            organization: {
                /** Format: uuid */
                id: string;
                name: string;
                /** @enum {unknown} */
                unitSystem?: "metric" | "imperial";
            };
            /** @description What this person may do, from the role x action matrix */
            actions: string[];
        };
        /** Change one's own profile */
        "me.update": {
            name?: string;
            /** @enum {unknown} */
            unitSystem?: "metric" | "imperial";
            /**
             * @description E-mail for each rejected reading, a daily digest, or none
             * @enum {unknown}
             */
            notifyRejections?: "each" | "digest" | "off";
            currentPassword?: string;
            newPassword?: string;
        };
        /** Define (POST) or change (PUT) a mold */
        "mold.create": {
            name: unknown;
            cavity: unknown;
        } & WithRequired<components["schemas"]["mold.geometry"], "name" | "cavity">;
        /**
         * A mold: its cavity, inserts and cavities
         * @description Used whole by POST/PUT /v1/molds and as an inline mold by POST /v1/targets/preview.
         */
        "mold.geometry": {
            /** @example Seat cushion, 2-up */
            name?: string;
            /** @description A short code of your own, unique in the organization */
            code?: string | null;
            /** @description One cavity, as measured (a water fill made with the inserts in place already excludes them) */
            cavity: components["schemas"]["volume-measurement"];
            /** @description Inserts, cores and embedded parts of one cavity that the foam does not fill */
            inserts?: components["schemas"]["volume-measurement"][];
            /**
             * @description Identical cavities filled from one mix
             * @default 1
             */
            cavities?: number;
            /** @description Pack factor used when a batch gives neither a target density nor a pack factor */
            defaultPackFactor?: number | null;
            notes?: string | null;
        };
        /** A mold with its computed volumes (m3) */
        "mold.view": {
            /** Format: uuid */
            id: string;
            name: string;
            code: string | null;
            cavity: components["schemas"]["volume-measurement"];
            inserts: components["schemas"]["volume-measurement"][];
            cavities: number;
            grossCavityVolumeM3: number;
            insertVolumeM3: number;
            cavityVolumeM3: number;
            totalVolumeM3: number;
            defaultPackFactor: number | null;
            notes: string | null;
            /** Format: date-time */
            createdAt: string;
            /** Format: date-time */
            updatedAt: string;
        };
        /** Overview query */
        "overview.query": {
            /**
             * @description IANA time zone whose calendar days count as days (the shop's, e.g. Europe/Lisbon); UTC when absent
             * @default UTC
             */
            timeZone?: string;
            /**
             * @description How many days, today included, the rejection rate covers
             * @default 14
             */
            days?: number;
            /**
             * Format: uuid
             * @description The material system whose ratio error per batch is charted; the most recently weighed one when absent
             */
            materialSystemId?: string;
        };
        /**
         * Shop-floor overview
         * @description Figures counted by the API in PostgreSQL over every reading and batch of the organization (not a sample).
         */
        "overview.view": {
            /** Format: date-time */
            generatedAt: string;
            timeZone: string;
            /**
             * Format: date
             * @description Today's date in timeZone
             */
            today: string;
            days: number;
            /** @description Batches with at least one settled mass reading received today */
            poursToday: number;
            /** @description Batches planned for today */
            plannedToday: number;
            readingsToday: number;
            /** @description Rejected readings not yet waived or upheld, whenever received */
            openRejections: number;
            /** @description Readings judged (accepted or rejected) over the days */
            judged: number;
            rejected: number;
            /** @description rejected ÷ judged over the days; null when nothing was judged */
            rejectionRatePercent: number | null;
            /** @description One entry per day, oldest first, today last */
            rejectionRateByDay: {
                /** Format: date */
                day: string;
                judged: number;
                rejected: number;
                ratePercent: number | null;
            }[];
            ratioError: {
                /**
                 * Format: uuid
                 * @description The system charted; null when no batch has both parts weighed
                 */
                materialSystemId: string | null;
                /** @description Systems with mass readings over the days, to choose from */
                systems: {
                    /** Format: uuid */
                    id: string;
                    name: string;
                }[];
                /** @description The latest batches (at most 200) with both parts weighed, oldest first: e = (m_A / m_B) ÷ (t_A / t_B) − 1 */
                points: {
                    /** Format: uuid */
                    batchId: string;
                    /** Format: date */
                    plannedFor: string;
                    errorPercent: number;
                    tolerancePercent: number;
                    /** Format: date-time */
                    lastReadingAt: string;
                }[];
                /** @description Points outside their ± tolerance */
                outside: number;
            };
        };
        /** Pareto query */
        "pareto.query": {
            /**
             * Format: date
             * @description First day (UTC), 30 days ago when absent
             */
            from?: string;
            /**
             * Format: date
             * @description Last day (UTC), today when absent
             */
            to?: string;
            /**
             * @default none
             * @enum {unknown}
             */
            groupBy?: "none" | "system" | "mold" | "station";
            /** Format: uuid */
            materialSystemId?: string;
            /** Format: uuid */
            moldId?: string;
            stationCode?: string;
        };
        /**
         * Defect causes by count, largest first, with the running share
         * @description Counted over the rework and scrap parts disposed in the period: a part with two causes counts once for each; a disposed batch with no part recorded counts each cause once per cavity.
         */
        "pareto.view": {
            /** Format: date */
            from: string;
            /** Format: date */
            to: string;
            /** @enum {unknown} */
            groupBy: "none" | "system" | "mold" | "station";
            groups: {
                key: string | null;
                name: string | null;
                defects: number;
                bars: {
                    code: string;
                    name: string;
                    count: number;
                    percent: number;
                    cumulativePercent: number;
                }[];
            }[];
        };
        /**
         * Record a demolded part: its mass, weighed or entered
         * @description Molded density = mass ÷ cavity volume (the batch's mold, as stored with its targets), judged against the batch's target density ± the system's part tolerance.
         */
        "part.create": {
            /**
             * @description Which cavity of the mold (1 when not given)
             * @default 1
             */
            cavity?: number;
            serial?: string | null;
            /** @description The part's mass (mass) */
            mass: components["schemas"]["quantity"];
            /**
             * @description scale: read off a registered scale (deviceId, or the calling device key's scale); entered: typed in
             * @default entered
             * @enum {unknown}
             */
            source?: "scale" | "entered";
            /** Format: uuid */
            deviceId?: string;
            /** Format: date-time */
            demoldedAt?: string;
        };
        /** A demolded part with its molded density and disposition */
        "part.view": {
            /** Format: uuid */
            id: string;
            /** Format: uuid */
            batchId: string;
            /** Format: uuid */
            workOrderId: string | null;
            cavity: number;
            serial: string | null;
            massKg: number;
            /** @enum {unknown} */
            massSource: "scale" | "entered";
            /** Format: uuid */
            deviceId: string | null;
            cavityVolumeM3: number;
            moldedDensityKgM3: number;
            targetDensityKgM3: number;
            tolerancePercent: number;
            deviationPercent: number;
            /** @enum {unknown} */
            densityVerdict: "within" | "below" | "above";
            /** @enum {unknown} */
            disposition: "accepted" | "rework" | "scrap" | null;
            defectCauses: string[];
            dispositionNote: string | null;
            specimens: components["schemas"]["specimen.view"][];
            createdBy: string | null;
            /** Format: date-time */
            demoldedAt: string;
            /** Format: date-time */
            createdAt: string;
        };
        /** Problem details (RFC 9457) */
        problem: {
            /** @description A URI reference naming the kind of problem; about:blank for a plain HTTP status. */
            type: string;
            /** @description A short summary of the kind of problem. */
            title: string;
            status: number;
            /** @description What went wrong with this request, for a person. */
            detail?: string;
            /** @description The path of the request. */
            instance?: string;
            /** @description Quote this when asking an operator about the request. */
            requestId?: string;
            /** @description Validation failures, each located by a JSON Pointer (RFC 6901) into the body or the query. */
            errors?: {
                /** @example /readings/3/value */
                pointer: string;
                detail: string;
                /** @description The JSON Schema keyword or rule that failed. */
                code?: string;
            }[];
        };
        /**
         * Record a QC cup test
         * @description A free-rise cup test in the terms of ASTM D7487: cream time, top-of-cup time, tack-free time (from the moment A meets B) and free-rise density. Cup tests feed the least-squares fit of expected free-rise density against component temperature.
         */
        "qc-cup-test.create": {
            /** Format: uuid */
            materialSystemId: string;
            /** Format: uuid */
            lotAId?: string | null;
            /** Format: uuid */
            lotBId?: string | null;
            /** @description Temperature */
            componentTemperatureA: components["schemas"]["quantity"];
            /** @description Temperature */
            componentTemperatureB: components["schemas"]["quantity"];
            /** @description Time */
            creamTime?: components["schemas"]["quantity"] | null;
            /** @description Time */
            topOfCupTime?: components["schemas"]["quantity"] | null;
            /** @description Time */
            tackFreeTime?: components["schemas"]["quantity"] | null;
            /** @description Density */
            freeRiseDensity: components["schemas"]["quantity"];
            /** Format: date-time */
            testedAt: string;
            notes?: string | null;
        };
        /** A cup test in ASTM D7487 terms (SI) */
        "qc-cup-test.view": {
            /** Format: uuid */
            id: string;
            /** Format: uuid */
            materialSystemId: string;
            materialSystemName: string;
            materialSystemRevision: number | null;
            /** Format: uuid */
            lotAId: string | null;
            /** Format: uuid */
            lotBId: string | null;
            componentTemperatureAC: number;
            componentTemperatureBC: number;
            creamTimeS: number | null;
            topOfCupTimeS: number | null;
            tackFreeTimeS: number | null;
            freeRiseDensityKgM3: number;
            /** Format: date-time */
            testedAt: string;
            notes: string | null;
            createdBy: string | null;
            /** Format: date-time */
            createdAt: string;
            /**
             * @description Against the system's reactivity window and free-rise density band (ASTM D7487 terms)
             * @enum {unknown}
             */
            verdict: "passed" | "failed" | "not_judged";
            findings: components["schemas"]["reading.reason"][];
            /** @description The measured density brought to the reference temperature with the system's slope */
            freeRiseDensityAtReferenceKgM3: number | null;
        };
        /**
         * A measured quantity: a value and its unit
         * @description The API accepts common shop units and stores SI. Mass: g, kg, lb, oz. Volume: mL, L, cm3, m3, in3, ft3, gal (US). Density: kg/m3, g/cm3, lb/ft3 (pcf). Temperature: degC, degF. Length: mm, cm, m, in, ft. Time: s, min, h. GET /v1/units lists them all.
         */
        quantity: {
            value: number;
            /**
             * @example g
             * @example lb
             * @example degC
             */
            unit: string;
        };
        /**
         * Queue dashboard session
         * @description A short-lived pass to the queue dashboard, carried by an HttpOnly cookie limited to the dashboard's path; open `url` in the same browser.
         */
        "queue-dashboard.session": {
            /**
             * @description Where the dashboard is (same origin)
             * @example /queues/
             */
            url: string;
            /**
             * Format: date-time
             * @description When the pass lapses; ask for a new one from the console
             */
            expiresAt: string;
        };
        /** Readiness: PostgreSQL and Redis are reachable */
        "readiness.view": {
            /** @constant */
            status: "ok";
            info?: {
                [key: string]: {
                    /** @enum {unknown} */
                    status: "up" | "down";
                    message?: string;
                };
            };
            error?: {
                [key: string]: {
                    /** @enum {unknown} */
                    status: "up" | "down";
                    message?: string;
                };
            };
            details: {
                [key: string]: {
                    /** @enum {unknown} */
                    status: "up" | "down";
                    message?: string;
                };
            };
        };
        /** A reading with its verdict (the fields every reading view has) */
        "reading.base": {
            /** Format: uuid */
            id: string;
            /** Format: uuid */
            batchId: string;
            /** Format: uuid */
            deviceId: string;
            clientReadingId: string;
            /** @enum {unknown} */
            quantity: "mass" | "temperature" | "humidity" | "milestone";
            /** @enum {unknown} */
            subject: "part_a" | "part_b" | "pigment" | "mixed" | "mold" | "ambient" | "mix_start" | "pour" | "demold";
            /** @description The value in SI (unitSi); for a milestone, 0 */
            valueSi: number;
            /** @enum {unknown} */
            unitSi: "kg" | "degC" | "%" | "s";
            /** @description The value and unit as posted */
            given: {
                value: number;
                unit: string;
            };
            stable: boolean;
            /**
             * Format: date-time
             * @description The device clock
             */
            deviceTime: string | null;
            /** Format: date-time */
            receivedAt: string;
            clockSkewSeconds: number | null;
            /** @description The device clock was more than 300 s off the received time */
            clockSkewFlagged: boolean;
            /**
             * @description pending until judged; unused: kept but not judged (an unstable mass)
             * @enum {unknown}
             */
            status: "pending" | "accepted" | "rejected" | "unused";
            reasons: components["schemas"]["reading.reason"][];
            /** Format: date-time */
            judgedAt: string | null;
            /** @description An engineer’s decision on a rejected reading */
            review: {
                /** @enum {unknown} */
                decision: "waive" | "uphold";
                note: string | null;
                /** @description Who decided */
                by: string | null;
                /** Format: date-time */
                at: string | null;
            } | null;
            /** @description Where to read the verdict */
            statusUrl: string;
        };
        /** The readings of a bulk post, in the order posted */
        "reading.bulk-result": {
            /** @description New readings are queued; a (device, clientReadingId) seen before answers with the first reading */
            items: (components["schemas"]["reading.queued"] | components["schemas"]["reading.replayed"])[];
        };
        /** Up to 1000 readings at once */
        "reading.bulk": {
            readings: components["schemas"]["reading.create"][];
        };
        /**
         * One reading from a scale, thermometer, hygrometer or logger, or a milestone of the pour
         * @description A device key's bound device is used; people name the device with deviceId. clientReadingId makes a replay harmless. A milestone (quantity "milestone": mix_start, pour, demold) carries no value: its time is deviceTime, or when it was received; pot life is judged from mix start to pour and the demold time from pour to demold.
         * @example {
         *       "batchId": "6f1c2d3e-0000-4000-8000-000000000001",
         *       "clientReadingId": "scale-2-000417",
         *       "quantity": "mass",
         *       "subject": "part_a",
         *       "value": 1.254,
         *       "unit": "kg",
         *       "stable": true,
         *       "deviceTime": "2026-06-01T08:15:02Z"
         *     }
         * @example {
         *       "batchId": "6f1c2d3e-0000-4000-8000-000000000001",
         *       "clientReadingId": "station-2-pour-17",
         *       "quantity": "milestone",
         *       "subject": "pour",
         *       "deviceTime": "2026-06-01T08:16:40Z"
         *     }
         */
        "reading.create": {
            /** Format: uuid */
            batchId: string;
            /** Format: uuid */
            deviceId?: string;
            clientReadingId: string;
            /** @enum {unknown} */
            quantity: "mass" | "temperature" | "humidity" | "milestone";
            /** @enum {unknown} */
            subject: "part_a" | "part_b" | "pigment" | "mixed" | "mold" | "ambient" | "mix_start" | "pour" | "demold";
            /** @description Required except for a milestone */
            value?: number;
            /** @description Required except for a milestone: kg, g, lb, oz; degC, degF, K; % for humidity */
            unit?: string;
            /**
             * @description The scale's stable (motion) flag; unstable masses are kept but not judged
             * @default true
             */
            stable?: boolean;
            /**
             * Format: date-time
             * @description The device's clock; readings are ordered by it and a skew over 300 s from the received time is flagged
             */
            deviceTime?: string;
        };
        /** A new reading, stored and queued for judging */
        "reading.queued": {
            /** Format: uuid */
            id: string;
            /** @constant */
            status: "pending";
            /** @description GET it for the verdict */
            statusUrl: string;
            /** @constant */
            replayed: false;
        };
        /**
         * A reason in a reading's verdict
         * @description Why a reading was rejected (or set aside): what was measured against which limit, in which unit
         */
        "reading.reason": {
            code: components["schemas"]["finding-code"];
            message: string;
            measured: number | null;
            limit: number | null;
            /**
             * @example %
             * @example kg
             * @example degC
             * @example s
             */
            unit: string | null;
            /** @description What the sentence needs besides the figures (part, side, target, readability, ...), so it can be written for another unit system */
            facts?: Record<string, never>;
        };
        /** A reading posted again: the first one, as stored */
        "reading.replayed": {
            /** @constant */
            replayed: true;
        } & components["schemas"]["reading.base"];
        /**
         * Waive or uphold a rejected reading
         * @description A waiver needs a note. Upholding puts the batch on hold, or scraps it with scrap: true.
         */
        "reading.review": {
            /** @enum {unknown} */
            decision: "waive" | "uphold";
            note?: string;
            /** @default false */
            scrap?: boolean;
        };
        /** A reading with its verdict and reasons */
        "reading.view": components["schemas"]["reading.base"];
        /** The recall report of a lot: every batch it went into */
        "recall.view": {
            /** Format: uuid */
            lotId: string;
            lotNumber: string;
            /** @enum {unknown} */
            part: "A" | "B" | "pigment";
            recall: {
                /** Format: date-time */
                at: string;
                reason: string | null;
                by: string | null;
            } | null;
            /** Format: date-time */
            generatedAt: string;
            rows: {
                /** Format: uuid */
                batchId: string;
                /** Format: date */
                plannedFor: string;
                state: string;
                /** Format: uuid */
                workOrderId: string | null;
                workOrderExternalRef: string | null;
                partNumber: string | null;
                moldName: string | null;
                stationCode: string | null;
                partCount: number;
                /** @enum {unknown} */
                disposition: "accepted" | "rework" | "scrap" | null;
                parts: {
                    accepted: number;
                    rework: number;
                    scrap: number;
                    undecided: number;
                };
            }[];
            totals: {
                batches: number;
                workOrders: number;
                parts: number;
            };
        };
        /** Record a test specimen cut from a part */
        "specimen.create": {
            /**
             * @description core_density: ASTM D3574 Test A / ISO 845 (mass and dimensions); indentation_force: ASTM D3574 Test B1, force at 25 % (flexible foams); durometer: ASTM D2240 (integral skin)
             * @enum {unknown}
             */
            test: "core_density" | "indentation_force" | "durometer";
            /** @description Specimen mass (core_density) */
            mass?: components["schemas"]["quantity"];
            /** @description Specimen dimensions (length), core_density */
            dimensions?: {
                length: components["schemas"]["quantity"];
                width: components["schemas"]["quantity"];
                thickness: components["schemas"]["quantity"];
            };
            /** @description Indentation force at 25 % deflection */
            force?: {
                value: number;
                /** @enum {unknown} */
                unit: "N" | "lbf";
            };
            durometer?: {
                /** @enum {unknown} */
                scale: "A" | "OO" | "D";
                value: number;
            };
            notes?: string | null;
        };
        /** A test specimen and its verdict against the system's spec */
        "specimen.view": {
            /** Format: uuid */
            id: string;
            /** Format: uuid */
            partId: string;
            /** @enum {unknown} */
            test: "core_density" | "indentation_force" | "durometer";
            massKg: number | null;
            volumeM3: number | null;
            densityKgM3: number | null;
            forceN: number | null;
            /** @enum {unknown} */
            durometerScale: "A" | "OO" | "D" | null;
            durometer: number | null;
            /**
             * @description null when the system states no spec for this test
             * @enum {unknown}
             */
            verdict: "within" | "below" | "above" | null;
            spec: {
                min: number | null;
                max: number | null;
            };
            notes: string | null;
            createdBy: string | null;
            /** Format: date-time */
            createdAt: string;
        };
        /** Computed batch targets as the API shows them (the fields of every targets view) */
        "targets.figures": {
            /** @enum {unknown} */
            unitSystem: "metric" | "imperial";
            computationVersion: string;
            /** @enum {unknown} */
            subject: "mold" | "free_rise_cup";
            cavityVolume: components["schemas"]["displayed-quantity"];
            cavities: number;
            totalVolume: components["schemas"]["displayed-quantity"];
            targetDensity: components["schemas"]["displayed-quantity"];
            /** @description Dimensionless (unit 1) */
            packFactor: components["schemas"]["quantity"];
            /** @enum {unknown} */
            densityBasis: "target_density" | "pack_factor" | "mold_default_pack_factor" | "free_rise_cup";
            expectedFreeRiseDensity: {
                density: components["schemas"]["displayed-quantity"];
                temperature: components["schemas"]["displayed-quantity"];
                atComponentTemperature: boolean;
                /** @enum {unknown} */
                method: "cup_test_fit" | "system_slope" | "reference_only";
                fit: {
                    slope: number;
                    intercept: number;
                    rSquared: number | null;
                    residualStandardDeviation: number;
                    count: number;
                } | null;
                /** @description Which estimate was used and why (the cup tests' line, or why it was not trusted) */
                methodReason?: string;
                /** @enum {unknown} */
                fitRejected?: "too_few_points" | "narrow_span" | "poor_fit" | "unexpected_sign" | "outside_tested_span" | null;
            };
            /** @description Dimensionless (unit 1) */
            expectedPackFactor: components["schemas"]["quantity"];
            foamMass: components["schemas"]["displayed-quantity"];
            mixedMass: components["schemas"]["displayed-quantity"];
            allowances: {
                overfillPercent: number;
                retentionPercent: number;
                convention: {
                    /** @enum {unknown} */
                    overfill: "multiplicative" | "delivered";
                    /** @enum {unknown} */
                    retention: "multiplicative" | "delivered";
                };
            };
            /** @enum {unknown} */
            ratioBasis: "weight" | "volume";
            weightRatio: {
                a: number;
                b: number;
            };
            volumeRatio: {
                a: number;
                b: number;
            };
            ratioTolerancePercent: number;
            components: {
                A: {
                    /** @enum {unknown} */
                    part: "A" | "B";
                    /** @enum {unknown} */
                    side: "isocyanate" | "polyol";
                    mass: components["schemas"]["displayed-quantity"];
                    massUnrounded: components["schemas"]["displayed-quantity"];
                    volume: components["schemas"]["displayed-quantity"] | null;
                    /** @description Mass range that keeps the ratio in tolerance with the other part at its target */
                    toleranceBand: {
                        low: components["schemas"]["displayed-quantity"];
                        high: components["schemas"]["displayed-quantity"];
                    };
                };
                B: {
                    /** @enum {unknown} */
                    part: "A" | "B";
                    /** @enum {unknown} */
                    side: "isocyanate" | "polyol";
                    mass: components["schemas"]["displayed-quantity"];
                    massUnrounded: components["schemas"]["displayed-quantity"];
                    volume: components["schemas"]["displayed-quantity"] | null;
                    /** @description Mass range that keeps the ratio in tolerance with the other part at its target */
                    toleranceBand: {
                        low: components["schemas"]["displayed-quantity"];
                        high: components["schemas"]["displayed-quantity"];
                    };
                };
                pigment: {
                    mass: components["schemas"]["displayed-quantity"];
                    massUnrounded: components["schemas"]["displayed-quantity"];
                    percentOfAB: number;
                    /** @description The percent as dosed, and of what */
                    dosed?: {
                        percent: number;
                        /** @enum {unknown} */
                        basis: "ab" | "polyol" | "total";
                    };
                    /**
                     * @description Weighed on its own, or pre-blended in a part (mass is then 0 and the part's target includes it)
                     * @enum {unknown}
                     */
                    placement?: "separate" | "A" | "B";
                };
            };
            totalMass: components["schemas"]["displayed-quantity"];
            scaleReadability: components["schemas"]["displayed-quantity"] | null;
            isocyanateIndex: {
                value: number;
                atToleranceLimits: {
                    low: number;
                    high: number;
                };
            } | null;
            timing: {
                potLife: components["schemas"]["displayed-quantity"] | null;
                demoldTime: components["schemas"]["displayed-quantity"] | null;
                fullCureTime: components["schemas"]["displayed-quantity"] | null;
            };
            componentTemperatureWindow: {
                min: components["schemas"]["displayed-quantity"];
                max: components["schemas"]["displayed-quantity"];
            } | null;
            warnings: components["schemas"]["batch-warning"][];
            cautions: components["schemas"]["caution"][];
            /** @description Where each input came from */
            sources: {
                system: {
                    /** Format: uuid */
                    id: string;
                    name: string;
                    revision: number;
                    /** Format: uuid */
                    revisionId: string;
                } | {
                    /** @constant */
                    inline: true;
                };
                mold: {
                    /** Format: uuid */
                    id: string;
                    name: string;
                    code: string | null;
                } | {
                    /** @constant */
                    inline: true;
                    grossCavityVolumeM3: number;
                    insertVolumeM3: number;
                } | null;
                scale: {
                    /** Format: uuid */
                    deviceId: string;
                    name: string;
                    serial: string;
                } | {
                    /** @constant */
                    inline: true;
                } | null;
                lots: {
                    /** @enum {unknown} */
                    part: "A" | "B" | "pigment";
                    /** Format: uuid */
                    id: string;
                    lotNumber: string;
                    /** Format: date */
                    expiresOn: string;
                }[];
                /** @description Cup tests fitted for the expected free-rise density */
                cupTests: number;
                /** Format: date */
                plannedFor: string;
            };
            /** @description The computation’s SI input, exactly as computed */
            inputs: {
                /** @description The system parameters in SI */
                system: Record<string, never>;
                /** @description The mold in SI (m3) */
                mold?: Record<string, never>;
                /** @description The cup in SI (m3) */
                freeRiseCup?: Record<string, never>;
                /** @description The options in SI */
                options: Record<string, never>;
                cupTests: {
                    temperature: number;
                    density: number;
                }[];
            };
            documents: {
                safetyDataSheets: components["schemas"]["document.view"][];
                sdsOnFile: boolean;
            };
        };
        /**
         * Compute batch targets without storing anything
         * @description A system by id (current or a given revision) or inline; a mold by id or inline, or a free-rise cup; and the options.
         */
        "targets.preview": {
            system: {
                /** Format: uuid */
                id?: string;
                revision?: number;
            };
            mold?: {
                /** Format: uuid */
                id?: string;
            };
            freeRiseCup?: {
                volume: components["schemas"]["quantity"];
            };
            options?: components["schemas"]["batch-options"];
        };
        /** Computed batch targets: every figure in the caller’s units with SI alongside, warnings and cautions */
        "targets.view": components["schemas"]["targets.figures"];
        /**
         * Change a person (admin)
         * @description PUT sends the whole record as the console has it; only name, role and disabled are changed, other known fields are ignored.
         */
        "user.update": {
            name?: string;
            /** @enum {unknown} */
            role?: "admin" | "engineer" | "integrator" | "viewer";
            disabled?: boolean;
            id?: string;
            email?: string;
            /** @enum {unknown} */
            unitSystem?: "metric" | "imperial";
            /** @enum {unknown} */
            notifyRejections?: "each" | "digest" | "off";
            lastSignInAt?: string | null;
            createdAt?: string;
        };
        /** A person of the organization */
        "user.view": {
            /** Format: uuid */
            id: string;
            email: string;
            name: string;
            /** @enum {unknown} */
            role: "admin" | "engineer" | "integrator" | "viewer";
            disabled: boolean;
            /** @enum {unknown} */
            unitSystem: "metric" | "imperial";
            /** @enum {unknown} */
            notifyRejections: "each" | "digest" | "off";
            /** Format: date-time */
            lastSignInAt: string | null;
            /** Format: date-time */
            createdAt: string;
        };
        /**
         * How a volume was measured
         * @description box: inside length × width × height; cylinder: inside diameter and height; water_fill: mass of the water that fills it and the water's temperature (0–40 °C); entered: a volume from CAD. The fields each kind needs are required (422 with a pointer when one is missing).
         */
        "volume-measurement": {
            /** @enum {unknown} */
            kind: "box" | "cylinder" | "water_fill" | "entered";
            length?: components["schemas"]["quantity"];
            width?: components["schemas"]["quantity"];
            height?: components["schemas"]["quantity"];
            diameter?: components["schemas"]["quantity"];
            waterMass?: components["schemas"]["quantity"];
            waterTemperature?: components["schemas"]["quantity"];
            volume?: components["schemas"]["quantity"];
        };
        /** A webhook delivery (the fields every delivery view has) */
        "webhook-delivery.base": {
            /** Format: uuid */
            id: string;
            /** Format: uuid */
            endpointId: string;
            /** Format: uuid */
            eventId: string;
            eventType: string;
            /** @enum {unknown} */
            status: "pending" | "delivering" | "succeeded" | "retrying" | "dead" | "cancelled";
            attempts: number;
            /** Format: date-time */
            nextAttemptAt: string | null;
            lastStatusCode: number | null;
            lastError: string | null;
            lastDurationMs: number | null;
            /** Format: date-time */
            deliveredAt: string | null;
            replays: number;
            /** Format: date-time */
            createdAt: string;
            /** Format: date-time */
            updatedAt: string;
        };
        /** A webhook delivery with every attempt */
        "webhook-delivery.detail": {
            attemptLog: {
                attempt: number;
                /** Format: date-time */
                startedAt: string;
                durationMs: number | null;
                statusCode: number | null;
                error: string | null;
                responseSnippet: string | null;
            }[];
        } & components["schemas"]["webhook-delivery.base"];
        /** Replay dead-lettered deliveries */
        "webhook-delivery.replay": {
            /** Format: date-time */
            since: string;
            /** Format: uuid */
            endpointId?: string;
        };
        /** How many dead-lettered deliveries were queued again */
        "webhook-delivery.replayed": {
            replayed: number;
        };
        /** A webhook delivery: status, attempts, last answer, next attempt */
        "webhook-delivery.view": components["schemas"]["webhook-delivery.base"];
        /** A webhook endpoint (the fields every endpoint view has) */
        "webhook-endpoint.base": {
            /** Format: uuid */
            id: string;
            url: string;
            description: string;
            /** @description Empty: every type */
            eventTypes: string[];
            enabled: boolean;
            disabledReason: string | null;
            /** @description Two secrets sign during a rotation overlap */
            secretRotating: boolean;
            /** Format: date-time */
            previousSecretUntil: string | null;
            /** Format: date-time */
            createdAt: string;
            /** Format: date-time */
            updatedAt: string;
        };
        /** Add a webhook endpoint */
        "webhook-endpoint.create": {
            /** @description http(s) URL of the receiver; must resolve to public addresses */
            url: string;
            description?: string;
            /** @description Empty or omitted: every event type */
            eventTypes?: ("webhook.test" | "reading.accepted" | "reading.rejected" | "reading.waived" | "reading.upheld" | "batch.created" | "batch.state_changed" | "batch.released" | "batch.on_hold" | "batch.scrapped" | "lot.held" | "lot.hold_released" | "work_order.created" | "work_order.changed" | "drift.detected" | "drift.acknowledged")[];
            enabled?: boolean;
        };
        /** A webhook endpoint with its signing secret: the only time it is shown */
        "webhook-endpoint.created": {
            /** @description Standard Webhooks secret */
            secret: string;
        } & components["schemas"]["webhook-endpoint.base"];
        /** Rotate the signing secret */
        "webhook-endpoint.rotate": {
            /**
             * @description How long the old secret keeps signing alongside the new one
             * @default 86400
             */
            overlapSeconds?: number;
        };
        /**
         * Change a webhook endpoint
         * @description PUT sends the whole record; read-only fields are ignored.
         */
        "webhook-endpoint.update": {
            /** @description http(s) URL of the receiver; must resolve to public addresses */
            url?: string;
            description?: string;
            /** @description Empty or omitted: every event type */
            eventTypes?: ("webhook.test" | "reading.accepted" | "reading.rejected" | "reading.waived" | "reading.upheld" | "batch.created" | "batch.state_changed" | "batch.released" | "batch.on_hold" | "batch.scrapped" | "lot.held" | "lot.hold_released" | "work_order.created" | "work_order.changed" | "drift.detected" | "drift.acknowledged")[];
            enabled?: boolean;
        };
        /** A webhook endpoint (never its secret) */
        "webhook-endpoint.view": components["schemas"]["webhook-endpoint.base"];
        /** What the receiver answered to a webhook.test event */
        "webhook-test.result": {
            statusCode: number | null;
            durationMs: number;
            retryAfter?: string;
            error?: string;
            ssrf?: boolean;
            responseSnippet?: string;
            /** Format: uuid */
            eventId: string;
            /** @enum {unknown} */
            verdict: "delivered" | "failed";
            /**
             * Format: uuid
             * @description The test send's row in the delivery log (GET /v1/webhook-deliveries/{id}); always present in answers of this version
             */
            deliveryId?: string;
            /** @description Why the send failed, in plain words (absent when delivered) */
            reason?: string;
        };
        /** Complete a work order */
        "work-order.complete": {
            note?: string | null;
        };
        /**
         * Post a work order
         * @description Idempotent on externalRef: the same reference with the same body answers 200 with the existing order; with another body, 409.
         */
        "work-order.create": {
            /**
             * @description The ERP's own reference for the order, unique in the organization
             * @example WO-2026-00417
             */
            externalRef: string;
            /** @description The ERP's part number */
            partNumber?: string | null;
            /** Format: uuid */
            moldId?: string | null;
            /** Format: uuid */
            materialSystemId?: string | null;
            /** @description Parts to make */
            quantity: number;
            /** Format: date */
            dueOn?: string | null;
            notes?: string | null;
            /**
             * @default open
             * @enum {unknown}
             */
            state?: "open" | "in_progress" | "done" | "cancelled";
        };
        /**
         * Change a work order
         * @description Fields not sent are kept. The externalRef cannot change.
         */
        "work-order.update": {
            /** @description Accepted only when it equals the stored one */
            externalRef?: string;
            partNumber?: string | null;
            /** Format: uuid */
            moldId?: string | null;
            /** Format: uuid */
            materialSystemId?: string | null;
            quantity?: number;
            /** Format: date */
            dueOn?: string | null;
            notes?: string | null;
            /** @enum {unknown} */
            state?: "open" | "in_progress" | "done" | "cancelled";
        };
        /** A work order */
        "work-order.view": {
            /** Format: uuid */
            id: string;
            externalRef: string;
            partNumber: string | null;
            /** Format: uuid */
            moldId: string | null;
            moldName: string | null;
            /** Format: uuid */
            materialSystemId: string | null;
            materialSystemName: string | null;
            quantity: number;
            /** Format: date */
            dueOn: string | null;
            notes: string | null;
            /** @enum {unknown} */
            state: "open" | "in_progress" | "done" | "cancelled";
            createdBy: string | null;
            /** Format: date-time */
            createdAt: string;
            /** Format: date-time */
            updatedAt: string;
        };
    };
    responses: never;
    parameters: never;
    requestBodies: never;
    headers: never;
    pathItems: never;
}
export type $defs = Record<string, never>;
export interface operations {
    Audit_list: {
        parameters: {
            query?: {
                /** @description JSON ["field","ASC"|"DESC"]; fields: createdAt, action, id */
                sort?: string;
                /** @description JSON [start,end], inclusive, at most 500 rows */
                range?: string;
                /** @description JSON object; filters: action, actorId, actorType, targetId, createdAt_gte, createdAt_lte */
                filter?: string;
            };
            header?: {
                /** @description ignored; the range query parameter wins */
                Range?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One page */
            200: {
                headers: {
                    /** @description audit-events <start>-<end>/<total>; the total is * beyond the count cap */
                    "Content-Range"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["audit-entry.view"][];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action audit:read (roles: admin) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Users_list: {
        parameters: {
            query?: {
                /** @description JSON ["field","ASC"|"DESC"]; fields: name, email, role, createdAt, lastSignInAt */
                sort?: string;
                /** @description JSON [start,end], inclusive, at most 500 rows */
                range?: string;
                /** @description JSON object; filters: q, role, disabled, id */
                filter?: string;
            };
            header?: {
                /** @description ignored; the range query parameter wins */
                Range?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One page */
            200: {
                headers: {
                    /** @description users <start>-<end>/<total>; the total is * beyond the count cap */
                    "Content-Range"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["user.view"][];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action people:read (roles: admin) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Users_get: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["user.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action people:read (roles: admin) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Users_update: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["user.update"];
            };
        };
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["user.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action people:manage (roles: admin) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Invitations_list: {
        parameters: {
            query?: {
                /** @description JSON ["field","ASC"|"DESC"]; fields: createdAt, email, expiresAt */
                sort?: string;
                /** @description JSON [start,end], inclusive, at most 500 rows */
                range?: string;
                /** @description JSON object; filters: email, role, id */
                filter?: string;
            };
            header?: {
                /** @description ignored; the range query parameter wins */
                Range?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One page */
            200: {
                headers: {
                    /** @description invitations <start>-<end>/<total>; the total is * beyond the count cap */
                    "Content-Range"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["invitation.view"][];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action people:read (roles: admin) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Invitations_invite: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["invitation.create"];
            };
        };
        responses: {
            /** @description Created */
            201: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["invitation.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action people:manage (roles: admin) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Invitations_get: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["invitation.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action people:read (roles: admin) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Invitations_revoke: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["invitation.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action people:manage (roles: admin) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Invitations_lookup: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["invitation.lookup"];
            };
        };
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["invitation.preview"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Invitations_accept: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["invitation.accept"];
            };
        };
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["invitation.accepted"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    ApiKeys_list: {
        parameters: {
            query?: {
                /** @description JSON ["field","ASC"|"DESC"]; fields: createdAt, name, lastUsedAt, expiresAt */
                sort?: string;
                /** @description JSON [start,end], inclusive, at most 500 rows */
                range?: string;
                /** @description JSON object; filters: q, kind, environment, deviceId, id */
                filter?: string;
            };
            header?: {
                /** @description ignored; the range query parameter wins */
                Range?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One page */
            200: {
                headers: {
                    /** @description api-keys <start>-<end>/<total>; the total is * beyond the count cap */
                    "Content-Range"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["api-key.view"][];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action api-keys:read (roles: admin, integrator) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    ApiKeys_create: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["api-key.create"];
            };
        };
        responses: {
            /** @description The key, with its secret (shown once) */
            201: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["api-key.created"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action api-keys:manage (roles: admin, integrator) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    ApiKeys_get: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["api-key.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action api-keys:read (roles: admin, integrator) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    ApiKeys_revoke: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["api-key.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action api-keys:manage (roles: admin, integrator) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    ApiKeys_rotate: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["api-key.rotate"];
            };
        };
        responses: {
            /** @description The successor key, with its secret (shown once) */
            201: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["api-key.created"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action api-keys:manage (roles: admin, integrator) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Auth_signIn: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["auth.sign-in"];
            };
        };
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["auth.session"];
                };
            };
            /** @description Throttled: too many attempts for this account or from this address */
            429: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Auth_refresh: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["auth.refresh"];
            };
        };
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["auth.session"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Auth_signOut: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["auth.refresh"];
            };
        };
        responses: {
            /** @description No content */
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Auth_me: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["me"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action profile:read (roles: admin, engineer, integrator, viewer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Auth_updateMe: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["me.update"];
            };
        };
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["me"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action profile:read (roles: admin, engineer, integrator, viewer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Devices_list: {
        parameters: {
            query?: {
                /** @description JSON ["field","ASC"|"DESC"]; fields: name, serial, kind, calibrationDue, createdAt */
                sort?: string;
                /** @description JSON [start,end], inclusive, at most 500 rows */
                range?: string;
                /** @description JSON object; filters: q, kind, stationId, retired, id */
                filter?: string;
            };
            header?: {
                /** @description ignored; the range query parameter wins */
                Range?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One page */
            200: {
                headers: {
                    /** @description devices <start>-<end>/<total>; the total is * beyond the count cap */
                    "Content-Range"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["device.view"][];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action devices:read (roles: admin, engineer, integrator, viewer; key scope devices:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Devices_create: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["device.create"];
            };
        };
        responses: {
            /** @description Created */
            201: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["device.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action devices:manage (roles: admin, integrator) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Devices_get: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["device.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action devices:read (roles: admin, engineer, integrator, viewer; key scope devices:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Devices_update: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["device.update"];
            };
        };
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["device.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action devices:manage (roles: admin, integrator) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    MaterialSystems_list: {
        parameters: {
            query?: {
                /** @description JSON ["field","ASC"|"DESC"]; fields: name, kind, revision, createdAt, updatedAt */
                sort?: string;
                /** @description JSON [start,end], inclusive, at most 500 rows */
                range?: string;
                /** @description JSON object; filters: q, kind, id */
                filter?: string;
            };
            header?: {
                /** @description ignored; the range query parameter wins */
                Range?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One page */
            200: {
                headers: {
                    /** @description material-systems <start>-<end>/<total>; the total is * beyond the count cap */
                    "Content-Range"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["material-system.view"][];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    MaterialSystems_create: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["material-system.create"];
            };
        };
        responses: {
            /** @description Created */
            201: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["material-system.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:write (roles: engineer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    MaterialSystems_get: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["material-system.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    MaterialSystems_update: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["material-system.create"];
            };
        };
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["material-system.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:write (roles: engineer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    MaterialSystems_revisions: {
        parameters: {
            query?: {
                /** @description JSON ["field","ASC"|"DESC"]; fields: revision, createdAt */
                sort?: string;
                /** @description JSON [start,end], inclusive, at most 500 rows */
                range?: string;
                /** @description JSON object; filters: none */
                filter?: string;
            };
            header?: {
                /** @description ignored; the range query parameter wins */
                Range?: string;
            };
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One page */
            200: {
                headers: {
                    /** @description material-system-revisions <start>-<end>/<total>; the total is * beyond the count cap */
                    "Content-Range"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["material-system-revision.view"][];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Documents_list: {
        parameters: {
            query: {
                kind: string;
            };
            header?: never;
            path: {
                /** @description Material system id */
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["document.view"][];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Documents_upload: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path: {
                /** @description Material system id */
                id: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "multipart/form-data": {
                    /**
                     * @description SDS (safety data sheet) or TDS (technical data sheet)
                     * @enum {unknown}
                     */
                    kind: "SDS" | "TDS";
                    title?: string;
                    /**
                     * Format: binary
                     * @description The PDF; checked by its content (%PDF-), size limited (413 above the limit)
                     */
                    file: string;
                };
            };
        };
        responses: {
            /** @description Created */
            201: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["document.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:write (roles: engineer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Documents_content: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                /** @description Material system id */
                id: string;
                documentId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The PDF */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/pdf": string;
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Lots_list: {
        parameters: {
            query?: {
                /** @description JSON ["field","ASC"|"DESC"]; fields: lotNumber, part, receivedOn, expiresOn, createdAt */
                sort?: string;
                /** @description JSON [start,end], inclusive, at most 500 rows */
                range?: string;
                /** @description JSON object; filters: q, part, materialSystemId, expiresBefore, expiresAfter, id */
                filter?: string;
            };
            header?: {
                /** @description ignored; the range query parameter wins */
                Range?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One page */
            200: {
                headers: {
                    /** @description lots <start>-<end>/<total>; the total is * beyond the count cap */
                    "Content-Range"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["lot.view"][];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Lots_create: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["lot.create"];
            };
        };
        responses: {
            /** @description Created */
            201: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["lot.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:write (roles: engineer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Lots_get: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["lot.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Lots_update: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["lot.create"];
            };
        };
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["lot.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:write (roles: engineer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Lots_releaseHold: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["lot.release-hold"];
            };
        };
        responses: {
            /** @description OK */
            200: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["lot.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action readings:review (roles: engineer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Molds_list: {
        parameters: {
            query?: {
                /** @description JSON ["field","ASC"|"DESC"]; fields: name, code, cavityVolumeM3, totalVolumeM3, createdAt */
                sort?: string;
                /** @description JSON [start,end], inclusive, at most 500 rows */
                range?: string;
                /** @description JSON object; filters: q, code, id */
                filter?: string;
            };
            header?: {
                /** @description ignored; the range query parameter wins */
                Range?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One page */
            200: {
                headers: {
                    /** @description molds <start>-<end>/<total>; the total is * beyond the count cap */
                    "Content-Range"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["mold.view"][];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Molds_create: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["mold.create"];
            };
        };
        responses: {
            /** @description Created */
            201: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["mold.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:write (roles: engineer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Molds_get: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["mold.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Molds_update: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["mold.create"];
            };
        };
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["mold.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:write (roles: engineer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    WorkOrders_list: {
        parameters: {
            query?: {
                /** @description JSON ["field","ASC"|"DESC"]; fields: externalRef, dueOn, state, quantity, createdAt, updatedAt */
                sort?: string;
                /** @description JSON [start,end], inclusive, at most 500 rows */
                range?: string;
                /** @description JSON object; filters: q, externalRef, state, moldId, materialSystemId, dueBefore, dueAfter, id */
                filter?: string;
            };
            header?: {
                /** @description ignored; the range query parameter wins */
                Range?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One page */
            200: {
                headers: {
                    /** @description work-orders <start>-<end>/<total>; the total is * beyond the count cap */
                    "Content-Range"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["work-order.view"][];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    WorkOrders_post: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["work-order.create"];
            };
        };
        responses: {
            /** @description Already posted with this body: the existing order */
            200: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["work-order.view"];
                };
            };
            /** @description Created */
            201: {
                headers: {
                    /** @description The address of the created resource */
                    Location?: string;
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["work-order.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action work-orders:write (roles: engineer; key scope work-orders:write) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Already posted with a different body */
            409: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    WorkOrders_get: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["work-order.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    WorkOrders_update: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["work-order.update"];
            };
        };
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["work-order.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action work-orders:write (roles: engineer; key scope work-orders:write) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Parts_list: {
        parameters: {
            query?: {
                /** @description JSON ["field","ASC"|"DESC"]; fields: createdAt, demoldedAt, moldedDensityKgM3, cavity */
                sort?: string;
                /** @description JSON [start,end], inclusive, at most 500 rows */
                range?: string;
                /** @description JSON object; filters: batchId, workOrderId, disposition, densityVerdict, id */
                filter?: string;
            };
            header?: {
                /** @description ignored; the range query parameter wins */
                Range?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One page */
            200: {
                headers: {
                    /** @description parts <start>-<end>/<total>; the total is * beyond the count cap */
                    "Content-Range"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["part.view"][];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Parts_get: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["part.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Parts_specimen: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["specimen.create"];
            };
        };
        responses: {
            /** @description Created */
            201: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["part.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action parts:write (roles: engineer; key scope readings:write) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    BatchParts_record: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["part.create"];
            };
        };
        responses: {
            /** @description Created */
            201: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["part.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action parts:write (roles: engineer; key scope readings:write) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    BatchParts_disposition: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["batch-disposition.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    BatchParts_dispose: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["batch-disposition.create"];
            };
        };
        responses: {
            /** @description Created */
            201: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["batch-disposition.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action parts:dispose (roles: engineer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    BatchParts_genealogy: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["batch-genealogy.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    DefectCauses_list: {
        parameters: {
            query?: {
                /** @description JSON ["field","ASC"|"DESC"]; fields: code, name, createdAt */
                sort?: string;
                /** @description JSON [start,end], inclusive, at most 500 rows */
                range?: string;
                /** @description JSON object; filters: q, active, id */
                filter?: string;
            };
            header?: {
                /** @description ignored; the range query parameter wins */
                Range?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One page */
            200: {
                headers: {
                    /** @description defect-causes <start>-<end>/<total>; the total is * beyond the count cap */
                    "Content-Range"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["defect-cause.view"][];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    DefectCauses_create: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["defect-cause.create"];
            };
        };
        responses: {
            /** @description Created */
            201: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["defect-cause.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action defect-causes:manage (roles: engineer, admin) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    DefectCauses_get: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["defect-cause.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    DefectCauses_update: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["defect-cause.update"];
            };
        };
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["defect-cause.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action defect-causes:manage (roles: engineer, admin) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    WorkOrderProduction_plan: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["batch-plan.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    WorkOrderProduction_consumption: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["consumption.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    WorkOrderProduction_consumptionCsv: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description work_order, part_number, ordered, batches, parts_accepted, parts_rework, parts_scrap, parts_undecided, yield, scrap_mass_kg, material, lot, lot_batches, planned_kg, actual_kg, variance_kg */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "text/csv": string;
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    WorkOrderProduction_complete: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["work-order.complete"];
            };
        };
        responses: {
            /** @description OK */
            200: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["consumption.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action parts:dispose (roles: engineer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    LotTrace_genealogy: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["lot-genealogy.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    LotTrace_report: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["recall.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    LotTrace_recall: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["lot.recall"];
            };
        };
        responses: {
            /** @description OK */
            200: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["recall.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action lots:recall (roles: engineer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    LotTrace_reportCsv: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description lot, part, batch, planned_for, state, work_order, part_number, mold, station, part_count, disposition, accepted, rework, scrap, undecided */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "text/csv": string;
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Defects_pareto: {
        parameters: {
            query?: {
                from?: string;
                to?: string;
                groupBy?: "none" | "system" | "mold" | "station";
                materialSystemId?: string;
                moldId?: string;
                stationCode?: string;
            };
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["pareto.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Targets_preview: {
        parameters: {
            query?: {
                /** @description Unit system of the figures (SI is always alongside); the caller's preference when not given */
                units?: "metric" | "imperial";
            };
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["targets.preview"];
            };
        };
        responses: {
            /** @description OK */
            200: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["targets.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action targets:read (roles: admin, engineer, integrator, viewer; key scope targets:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Batches_list: {
        parameters: {
            query?: {
                /** @description JSON ["field","ASC"|"DESC"]; fields: createdAt, plannedFor, state, totalMassKg */
                sort?: string;
                /** @description JSON [start,end], inclusive, at most 500 rows */
                range?: string;
                /** @description JSON object; filters: state, workOrderId, moldId, materialSystemId, plannedAfter, plannedBefore, id */
                filter?: string;
            };
            header?: {
                /** @description ignored; the range query parameter wins */
                Range?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One page */
            200: {
                headers: {
                    /** @description batches <start>-<end>/<total>; the total is * beyond the count cap */
                    "Content-Range"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["batch.view"][];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Batches_create: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["batch.create"];
            };
        };
        responses: {
            /** @description Created */
            201: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["batch.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:write (roles: engineer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Batches_get: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["batch.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Batches_targets: {
        parameters: {
            query?: {
                /** @description Unit system of the figures (SI is always alongside); the caller's preference when not given */
                units?: "metric" | "imperial";
            };
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["batch-targets.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action targets:read (roles: admin, engineer, integrator, viewer; key scope targets:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Batches_transitions: {
        parameters: {
            query?: {
                /** @description JSON ["field","ASC"|"DESC"]; fields: at */
                sort?: string;
                /** @description JSON [start,end], inclusive, at most 500 rows */
                range?: string;
                /** @description JSON object; filters: none */
                filter?: string;
            };
            header?: {
                /** @description ignored; the range query parameter wins */
                Range?: string;
            };
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One page */
            200: {
                headers: {
                    /** @description batch-state-transitions <start>-<end>/<total>; the total is * beyond the count cap */
                    "Content-Range"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["batch-transition.view"][];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Readings_list: {
        parameters: {
            query?: {
                /** @description JSON ["field","ASC"|"DESC"]; fields: receivedAt, deviceTime, status, judgedAt */
                sort?: string;
                /** @description JSON [start,end], inclusive, at most 500 rows */
                range?: string;
                /** @description JSON object; filters: status, batchId, deviceId, quantity, subject, reasonCode, reviewed, receivedAfter, receivedBefore, id */
                filter?: string;
            };
            header?: {
                /** @description ignored; the range query parameter wins */
                Range?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One page */
            200: {
                headers: {
                    /** @description readings <start>-<end>/<total>; the total is * beyond the count cap */
                    "Content-Range"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["reading.view"][];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action readings:read (roles: admin, engineer, integrator, viewer; key scope readings:write) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Readings_create: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["reading.create"];
            };
        };
        responses: {
            /** @description Posted before (same device and clientReadingId): the first reading */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["reading.replayed"];
                };
            };
            /** @description Stored and queued for judging */
            202: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["reading.queued"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action readings:write (roles: engineer; key scope readings:write) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Readings_get: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["reading.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action readings:read (roles: admin, engineer, integrator, viewer; key scope readings:write) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Readings_bulk: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["reading.bulk"];
            };
        };
        responses: {
            /** @description Every reading was posted before */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["reading.bulk-result"];
                };
            };
            /** @description Stored; the new readings are queued for judging */
            202: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["reading.bulk-result"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action readings:write (roles: engineer; key scope readings:write) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Readings_review: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["reading.review"];
            };
        };
        responses: {
            /** @description OK */
            200: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["reading.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action readings:review (roles: engineer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    BatchRelease_check: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["batch-release-check.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    BatchRelease_release: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["batch.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action readings:review (roles: engineer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Live_ticket: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["live.ticket.create"];
            };
        };
        responses: {
            /** @description Created */
            201: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["live.ticket"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action readings:read (roles: admin, engineer, integrator, viewer; key scope readings:write) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Live_stream: {
        parameters: {
            query: {
                /** @description From POST /v1/live/tickets */
                ticket: unknown;
            };
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description An SSE stream: `event: ready` (live.ready), then `event: reading` lines whose data is a live.event */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "text/event-stream": string;
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Control_listCharts: {
        parameters: {
            query?: {
                /** @description JSON ["field","ASC"|"DESC"]; fields: createdAt, name, metric */
                sort?: string;
                /** @description JSON [start,end], inclusive, at most 500 rows */
                range?: string;
                /** @description JSON object; filters: materialSystemId, metric, stationId, deviceId, lotId, id */
                filter?: string;
            };
            header?: {
                /** @description ignored; the range query parameter wins */
                Range?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One page */
            200: {
                headers: {
                    /** @description control-charts <start>-<end>/<total>; the total is * beyond the count cap */
                    "Content-Range"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["control-chart.view"][];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action control:read (roles: admin, engineer, integrator, viewer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Control_createChart: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["control-chart.create"];
            };
        };
        responses: {
            /** @description Created */
            201: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["control-chart.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action control:manage (roles: engineer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Control_getChart: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["control-chart.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action control:read (roles: admin, engineer, integrator, viewer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Control_updateChart: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["control-chart.update"];
            };
        };
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["control-chart.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action control:manage (roles: engineer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Control_freeze: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["control-chart.baseline"];
            };
        };
        responses: {
            /** @description OK */
            200: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["control-chart.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action control:manage (roles: engineer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Control_data: {
        parameters: {
            query?: {
                /** @description ISO 8601 date-time: points at or after */
                from?: string;
                /** @description ISO 8601 date-time: points before */
                to?: string;
                /** @description the newest points of the period, 2 to 5000 (default 500) */
                limit?: number;
            };
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["control-chart-data.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action control:read (roles: admin, engineer, integrator, viewer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Control_csv: {
        parameters: {
            query?: {
                /** @description ISO 8601 date-time: points at or after */
                from?: string;
                /** @description ISO 8601 date-time: points before */
                to?: string;
                /** @description the newest points of the period, 2 to 5000 (default 500) */
                limit?: number;
            };
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One row per point: at, value, moving_range, centre, lcl, ucl, limits, signals, reading_id, batch_id */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "text/csv": string;
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action control:read (roles: admin, engineer, integrator, viewer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Control_listSignals: {
        parameters: {
            query?: {
                /** @description JSON ["field","ASC"|"DESC"]; fields: raisedAt, rule */
                sort?: string;
                /** @description JSON [start,end], inclusive, at most 500 rows */
                range?: string;
                /** @description JSON object; filters: chartId, rule, acknowledged, materialSystemId, metric, batchId, raisedAfter, raisedBefore, id */
                filter?: string;
            };
            header?: {
                /** @description ignored; the range query parameter wins */
                Range?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One page */
            200: {
                headers: {
                    /** @description control-signals <start>-<end>/<total>; the total is * beyond the count cap */
                    "Content-Range"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["control-signal.view"][];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action control:read (roles: admin, engineer, integrator, viewer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Control_getSignal: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["control-signal.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action control:read (roles: admin, engineer, integrator, viewer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Control_acknowledge: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["control-signal.acknowledge"];
            };
        };
        responses: {
            /** @description OK */
            200: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["control-signal.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action control:manage (roles: engineer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Imports_list: {
        parameters: {
            query?: {
                /** @description JSON ["field","ASC"|"DESC"]; fields: createdAt, status */
                sort?: string;
                /** @description JSON [start,end], inclusive, at most 500 rows */
                range?: string;
                /** @description JSON object; filters: status, id */
                filter?: string;
            };
            header?: {
                /** @description ignored; the range query parameter wins */
                Range?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One page */
            200: {
                headers: {
                    /** @description imports <start>-<end>/<total>; the total is * beyond the count cap */
                    "Content-Range"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["import.view"][];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action readings:read (roles: admin, engineer, integrator, viewer; key scope readings:write) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Imports_upload: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "multipart/form-data": {
                    /**
                     * Format: binary
                     * @description A logger CSV (UTF-8, at most 5 MB) with a header row naming its columns, in any order: client_reading_id, batch_id, quantity, subject (required), device_id, device_time, value, unit, stable. One reading per row, as in POST /v1/readings; device_id may be empty for a device key.
                     */
                    file: string;
                };
            };
        };
        responses: {
            /** @description This file was uploaded before: the first import */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["import.upload"];
                };
            };
            /** @description Queued */
            202: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["import.upload"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action imports:write (roles: engineer, integrator; key scope readings:write) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Imports_get: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["import.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action readings:read (roles: admin, engineer, integrator, viewer; key scope readings:write) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    QcCupTests_list: {
        parameters: {
            query?: {
                /** @description JSON ["field","ASC"|"DESC"]; fields: testedAt, freeRiseDensityKgM3, createdAt */
                sort?: string;
                /** @description JSON [start,end], inclusive, at most 500 rows */
                range?: string;
                /** @description JSON object; filters: materialSystemId, testedAfter, testedBefore, id */
                filter?: string;
            };
            header?: {
                /** @description ignored; the range query parameter wins */
                Range?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One page */
            200: {
                headers: {
                    /** @description qc-cup-tests <start>-<end>/<total>; the total is * beyond the count cap */
                    "Content-Range"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["qc-cup-test.view"][];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    QcCupTests_create: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["qc-cup-test.create"];
            };
        };
        responses: {
            /** @description Created */
            201: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["qc-cup-test.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:write (roles: engineer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    QcCupTests_get: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["qc-cup-test.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    QcCupTests_fit: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["free-rise-fit.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action shop:read (roles: admin, engineer, integrator, viewer; key scope shop:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Events_feed: {
        parameters: {
            query?: {
                after?: string;
                limit?: number;
                type?: ("webhook.test" | "reading.accepted" | "reading.rejected" | "reading.waived" | "reading.upheld" | "batch.created" | "batch.state_changed" | "batch.released" | "batch.on_hold" | "batch.scrapped" | "lot.held" | "lot.hold_released" | "work_order.created" | "work_order.changed" | "drift.detected" | "drift.acknowledged")[];
            };
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["event.feed"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action events:read (roles: admin, engineer, integrator; key scope events:read) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    WebhookEndpoints_list: {
        parameters: {
            query?: {
                /** @description JSON ["field","ASC"|"DESC"]; fields: createdAt, url */
                sort?: string;
                /** @description JSON [start,end], inclusive, at most 500 rows */
                range?: string;
                /** @description JSON object; filters: enabled, q, id */
                filter?: string;
            };
            header?: {
                /** @description ignored; the range query parameter wins */
                Range?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One page */
            200: {
                headers: {
                    /** @description webhook-endpoints <start>-<end>/<total>; the total is * beyond the count cap */
                    "Content-Range"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["webhook-endpoint.view"][];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action webhooks:read (roles: admin, integrator) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    WebhookEndpoints_create: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["webhook-endpoint.create"];
            };
        };
        responses: {
            /** @description The endpoint with its signing secret */
            201: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["webhook-endpoint.created"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action webhooks:manage (roles: admin, integrator) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    WebhookEndpoints_get: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["webhook-endpoint.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action webhooks:read (roles: admin, integrator) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    WebhookEndpoints_update: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["webhook-endpoint.update"];
            };
        };
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["webhook-endpoint.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action webhooks:manage (roles: admin, integrator) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    WebhookEndpoints_remove: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description What was removed */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["webhook-endpoint.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action webhooks:manage (roles: admin, integrator) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    WebhookEndpoints_rotate: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["webhook-endpoint.rotate"];
            };
        };
        responses: {
            /** @description The endpoint with its new signing secret */
            201: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["webhook-endpoint.created"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action webhooks:manage (roles: admin, integrator) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    WebhookEndpoints_test: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["webhook-test.result"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action webhooks:manage (roles: admin, integrator) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    WebhookDeliveries_list: {
        parameters: {
            query?: {
                /** @description JSON ["field","ASC"|"DESC"]; fields: createdAt, updatedAt, status, attempts */
                sort?: string;
                /** @description JSON [start,end], inclusive, at most 500 rows */
                range?: string;
                /** @description JSON object; filters: endpointId, status, eventType, eventId, createdAt_gte, id */
                filter?: string;
            };
            header?: {
                /** @description ignored; the range query parameter wins */
                Range?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description One page */
            200: {
                headers: {
                    /** @description webhook-deliveries <start>-<end>/<total>; the total is * beyond the count cap */
                    "Content-Range"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["webhook-delivery.view"][];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action webhooks:read (roles: admin, integrator) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    WebhookDeliveries_get: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["webhook-delivery.detail"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action webhooks:read (roles: admin, integrator) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    WebhookDeliveries_replay: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path: {
                id: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["webhook-delivery.detail"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action webhooks:manage (roles: admin, integrator) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    WebhookDeliveries_replayAll: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["webhook-delivery.replay"];
            };
        };
        responses: {
            /** @description OK */
            200: {
                headers: {
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["webhook-delivery.replayed"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action webhooks:manage (roles: admin, integrator) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    QueueDashboard_open: {
        parameters: {
            query?: never;
            header?: {
                /** @description A unique key per request (a UUID). Within 24 h the same key with the same request returns the first response again (header Idempotent-Replayed: true); with another request, 422; while the first is still running, 409 with Retry-After. A request that failed keeps no key. */
                "Idempotency-Key"?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Created */
            201: {
                headers: {
                    /** @description pourgate_queues=…; Path=/queues; HttpOnly; SameSite=Strict */
                    "Set-Cookie"?: unknown;
                    /** @description true when this is the stored response of an earlier request with the same Idempotency-Key */
                    "Idempotent-Replayed"?: "true";
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["queue-dashboard.session"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action queues:read (roles: admin) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Overview_get: {
        parameters: {
            query?: {
                timeZone?: string;
                days?: number;
                materialSystemId?: string;
            };
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["overview.view"];
                };
            };
            /** @description No valid credentials */
            401: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description Needs the action overview:read (roles: admin, engineer, integrator, viewer) */
            403: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Health_alive: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description OK */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["health.view"];
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
    Health_ready: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /**
             * @description OK
             *
             *     The Health Check is successful
             */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        /**
                         * @example ok
                         * @enum {string}
                         */
                        status?: "ok" | "degraded";
                        /**
                         * @example {
                         *       "database": {
                         *         "status": "up",
                         *         "responseTime": 12
                         *       }
                         *     }
                         */
                        info?: {
                            [key: string]: {
                                /** @enum {string} */
                                status: "up" | "degraded" | "down";
                                /** @description Time the health indicator took to respond, in ms */
                                responseTime?: number;
                            } & {
                                [key: string]: unknown;
                            };
                        } | null;
                        /** @example {} */
                        error?: {
                            [key: string]: {
                                /** @enum {string} */
                                status: "up" | "degraded" | "down";
                                /** @description Time the health indicator took to respond, in ms */
                                responseTime?: number;
                            } & {
                                [key: string]: unknown;
                            };
                        } | null;
                        /**
                         * @example {
                         *       "database": {
                         *         "status": "up",
                         *         "responseTime": 12
                         *       }
                         *     }
                         */
                        details?: {
                            [key: string]: {
                                /** @enum {string} */
                                status: "up" | "degraded" | "down";
                                /** @description Time the health indicator took to respond, in ms */
                                responseTime?: number;
                            } & {
                                [key: string]: unknown;
                            };
                        };
                    };
                };
            };
            /**
             * @description A dependency is down (problem+json, with per-check details)
             *
             *     The Health Check is not successful
             */
            503: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": {
                        /**
                         * @example error
                         * @enum {string}
                         */
                        status?: "error" | "shutting_down";
                        /**
                         * @example {
                         *       "database": {
                         *         "status": "up",
                         *         "responseTime": 12
                         *       }
                         *     }
                         */
                        info?: {
                            [key: string]: {
                                /** @enum {string} */
                                status: "up" | "degraded" | "down";
                                /** @description Time the health indicator took to respond, in ms */
                                responseTime?: number;
                            } & {
                                [key: string]: unknown;
                            };
                        } | null;
                        /**
                         * @example {
                         *       "redis": {
                         *         "status": "down",
                         *         "message": "Could not connect",
                         *         "responseTime": 3005
                         *       }
                         *     }
                         */
                        error?: {
                            [key: string]: {
                                /** @enum {string} */
                                status: "up" | "degraded" | "down";
                                /** @description Time the health indicator took to respond, in ms */
                                responseTime?: number;
                            } & {
                                [key: string]: unknown;
                            };
                        } | null;
                        /**
                         * @example {
                         *       "database": {
                         *         "status": "up",
                         *         "responseTime": 12
                         *       },
                         *       "redis": {
                         *         "status": "down",
                         *         "message": "Could not connect",
                         *         "responseTime": 3005
                         *       }
                         *     }
                         */
                        details?: {
                            [key: string]: {
                                /** @enum {string} */
                                status: "up" | "degraded" | "down";
                                /** @description Time the health indicator took to respond, in ms */
                                responseTime?: number;
                            } & {
                                [key: string]: unknown;
                            };
                        };
                    };
                };
            };
            /** @description An error, as RFC 9457 problem details */
            default: {
                headers: {
                    /** @description Seconds to wait before retrying (429, 503, and 409 for an Idempotency-Key still in flight) */
                    "Retry-After"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/problem+json": components["schemas"]["problem"];
                };
            };
        };
    };
}
type WithRequired<T, K extends keyof T> = T & {
    [P in K]-?: T[P];
};
