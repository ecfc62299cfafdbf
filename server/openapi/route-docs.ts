import type { z } from 'zod';
import { alternatesQuerySchema, alternatesResponseSchema } from '../../shared/schemas/alternates';
import {
  acceptInviteBodySchema,
  csrfResponseSchema,
  invitationResponseSchema,
  inviteTokenParamSchema,
  loginBodySchema,
  userResponseSchema,
} from '../../shared/schemas/auth';
import { apiKeyIdParamSchema, apiKeyListSchema, createApiKeyBodySchema, createdApiKeySchema } from '../../shared/schemas/api-keys';
import { benchBodySchema, benchResultSchema } from '../../shared/schemas/bench';
import { brandResponseSchema, brandsResponseSchema, createBrandBodySchema } from '../../shared/schemas/brands';
import { idParamSchema } from '../../shared/schemas/common';
import { coilCompareBodySchema, compatResultSchema, plugCompareBodySchema } from '../../shared/schemas/compat';
import {
  emailFitReportBodySchema,
  emailSentResponseSchema,
  fitReportBodySchema,
  fitReportResponseSchema,
  fitReportsQuerySchema,
  fitReportsResponseSchema,
  sharedFitReportResponseSchema,
  updateFitReportBodySchema,
  shareTokenParamSchema,
} from '../../shared/schemas/fit-reports';
import { createInterchangeBodySchema, interchangeResponseSchema } from '../../shared/schemas/interchange';
import { jobIdParamSchema, jobsResponseSchema, retryJobResponseSchema } from '../../shared/schemas/jobs';
import {
  locationBodySchema,
  locationQuerySchema,
  locationResponseSchema,
  locationsResponseSchema,
  transferRequestBodySchema,
  transferResponseSchema,
  transferStepBodySchema,
  transfersQuerySchema,
  transfersResponseSchema,
  updateLocationBodySchema,
} from '../../shared/schemas/locations';
import { outboxResponseSchema } from '../../shared/schemas/outbox';
import { createPartBodySchema, partDetailSchema, partQuerySchema, updatePartBodySchema } from '../../shared/schemas/parts';
import {
  commitPriceListResponseSchema,
  PRICE_LIST_UPLOAD_FIELD,
  previewPriceListBodySchema,
  priceListChangesQuerySchema,
  priceListChangesSchema,
  priceListErrorsQuerySchema,
  priceListErrorsSchema,
  priceListHistoryQuerySchema,
  priceListHistorySchema,
  priceListSchema,
  uploadPriceListFieldsSchema,
} from '../../shared/schemas/price-lists';
import { searchQuerySchema, searchResponseSchema } from '../../shared/schemas/search';
import { settingsResponseSchema, updateSettingsBodySchema } from '../../shared/schemas/settings';
import {
  createSupplierBodySchema,
  supplierResponseSchema,
  suppliersQuerySchema,
  suppliersResponseSchema,
  updateSupplierBodySchema,
} from '../../shared/schemas/suppliers';
import { sellPriceRuleResponseSchema, sellPriceRulesResponseSchema, setSellPriceRuleBodySchema } from '../../shared/schemas/sell-price';
import { healthResponseSchema, openApiDocumentSchema } from '../../shared/schemas/system';
import {
  inviteBodySchema,
  invitedResponseSchema,
  updateUserBodySchema,
  shopsResponseSchema,
  teamMemberResponseSchema,
  teamResponseSchema,
} from '../../shared/schemas/users';
import {
  engineDetailSchema,
  vehicleEnginesQuerySchema,
  vehicleEnginesResponseSchema,
  vehicleMakesQuerySchema,
  vehicleMakesResponseSchema,
  vehicleModelsQuerySchema,
  vehicleModelsResponseSchema,
  vehicleYearsResponseSchema,
} from '../../shared/schemas/vehicles';
import type { RouteKey } from '../routes/route-access';

export const TAGS = [
  'system',
  'auth',
  'team',
  'vehicles',
  'parts',
  'search',
  'brands',
  'interchange',
  'compare',
  'bench',
  'fit reports',
  'settings',
  'suppliers',
  'price lists',
  'jobs',
  'stores',
  'api keys',
] as const;

export type SuccessStatus = 200 | 201 | 202 | 204;
/** Errors a route answers beyond those its inputs and access imply (see `errorStatuses`). */
export type ErrorStatus = 400 | 401 | 404 | 409 | 413 | 415 | 429 | 503;

/** A success answer: a JSON schema, a CSV file, or no body. */
export type Answer = z.ZodType | 'csv' | 'empty';

export interface RouteDoc {
  tag: (typeof TAGS)[number];
  summary: string;
  description?: string;
  params?: z.ZodObject;
  query?: z.ZodObject;
  /** A JSON body. */
  body?: z.ZodType;
  /** A multipart/form-data body: its text fields, and the name of its file part. */
  form?: { fields: z.ZodObject; file: string };
  responses: Partial<Record<SuccessStatus, Answer>>;
  errors?: readonly ErrorStatus[];
}

/**
 * The contract of every API route, keyed like ROUTE_ACCESS: what it takes and what it answers.
 * The OpenAPI document (`GET /api/openapi.json`) is generated from this table, the API tests
 * check every answer against it, and the NUL test sends a NUL byte into every text field it lists.
 * A route missing here does not compile (the table must cover every RouteKey).
 */
export const ROUTE_DOCS = {
  'GET /api/health': { tag: 'system', summary: 'The app answers', responses: { 200: healthResponseSchema } },
  'GET /api/openapi.json': { tag: 'system', summary: 'This OpenAPI 3.1 document', responses: { 200: openApiDocumentSchema } },

  'GET /api/auth/csrf': {
    tag: 'auth',
    summary: 'A CSRF token',
    description: 'Every state-changing request sends it in the `x-csrf-token` header; the matching cookie is set here.',
    responses: { 200: csrfResponseSchema },
  },
  'POST /api/auth/login': {
    tag: 'auth',
    summary: 'Sign in',
    description: 'Starts a session (cookie `arcwise.sid`). Failed attempts are limited per account and per address.',
    body: loginBodySchema,
    responses: { 200: userResponseSchema },
    errors: [401, 429],
  },
  'POST /api/auth/logout': { tag: 'auth', summary: 'Sign out', responses: { 204: 'empty' } },
  'GET /api/auth/me': { tag: 'auth', summary: 'Who is signed in', responses: { 200: userResponseSchema } },
  'POST /api/auth/accept-invite': {
    tag: 'auth',
    summary: 'Set a password from an invitation link',
    body: acceptInviteBodySchema,
    responses: { 200: userResponseSchema },
  },
  'GET /api/auth/invite/:token': {
    tag: 'auth',
    summary: 'Whom an invitation link invites',
    params: inviteTokenParamSchema,
    responses: { 200: invitationResponseSchema },
  },

  'GET /api/users': { tag: 'team', summary: 'The team', responses: { 200: teamResponseSchema } },
  'POST /api/users/invite': {
    tag: 'team',
    summary: 'Invite a person by e-mail',
    description: 'Creates the account without a password and e-mails a one-time link to set one.',
    body: inviteBodySchema,
    responses: { 201: invitedResponseSchema },
    errors: [409],
  },
  'PATCH /api/users/:id': {
    tag: 'team',
    summary: "Change a person's role, shop or access",
    params: idParamSchema,
    body: updateUserBodySchema,
    responses: { 200: teamMemberResponseSchema },
  },
  'GET /api/shops': { tag: 'team', summary: 'The shops a technician can belong to', responses: { 200: shopsResponseSchema } },
  'GET /api/outbox': {
    tag: 'team',
    summary: "The local mail catcher's messages",
    description: 'Only while the local mail catcher is in use (404 otherwise).',
    responses: { 200: outboxResponseSchema },
    errors: [404, 503],
  },

  'GET /api/jobs': {
    tag: 'jobs',
    summary: 'Follow-up jobs waiting for another attempt or out of attempts',
    responses: { 200: jobsResponseSchema },
  },
  'POST /api/jobs/:id/retry': {
    tag: 'jobs',
    summary: 'Run a failed follow-up job again',
    params: jobIdParamSchema,
    responses: { 200: retryJobResponseSchema },
    errors: [404, 409],
  },

  'GET /api/locations': {
    tag: 'stores',
    summary: "The chain's stores, the first opened first",
    responses: { 200: locationsResponseSchema },
  },
  'POST /api/locations': {
    tag: 'stores',
    summary: 'Add a store to the chain',
    body: locationBodySchema,
    responses: { 201: locationResponseSchema },
    errors: [409],
  },
  'PATCH /api/locations/:id': {
    tag: 'stores',
    summary: "Change a store's name, address, phone or opening hours",
    params: idParamSchema,
    body: updateLocationBodySchema,
    responses: { 200: locationResponseSchema },
    errors: [404, 409],
  },
  'GET /api/transfers': {
    tag: 'stores',
    summary: "The transfers your store sends or receives, newest first (an admin without a home store: the chain's)",
    query: transfersQuerySchema,
    responses: { 200: transfersResponseSchema },
  },
  'POST /api/transfers': {
    tag: 'stores',
    summary: 'Ask another store for parts, to be sent to your home store',
    description: 'The requester is e-mailed at each later step.',
    body: transferRequestBodySchema,
    responses: { 201: transferResponseSchema },
  },
  'POST /api/transfers/:id/steps': {
    tag: 'stores',
    summary: 'Move a transfer on: pick, send, refuse (the source store), receive or cancel (the requesting store)',
    description:
      'Each step applies only from the state it expects: of two people acting at once, the second gets a 409. Receiving moves the stock from the source store to yours in one transaction, never below zero (409 when the source has too few).',
    params: idParamSchema,
    body: transferStepBodySchema,
    responses: { 200: transferResponseSchema },
    errors: [404, 409],
  },

  'GET /api/api-keys': {
    tag: 'api keys',
    summary: "The store's API keys, without the keys themselves",
    responses: { 200: apiKeyListSchema },
  },
  'POST /api/api-keys': {
    tag: 'api keys',
    summary: 'Make an API key for another system; the key is in this answer only',
    body: createApiKeyBodySchema,
    responses: { 201: createdApiKeySchema },
    errors: [409],
  },
  'DELETE /api/api-keys/:id': {
    tag: 'api keys',
    summary: 'Revoke an API key: its next call is a 401',
    params: apiKeyIdParamSchema,
    responses: { 204: 'empty' },
  },

  'GET /api/vehicles/years': { tag: 'vehicles', summary: 'Model years on file', responses: { 200: vehicleYearsResponseSchema } },
  'GET /api/vehicles/makes': {
    tag: 'vehicles',
    summary: 'Makes of a year',
    query: vehicleMakesQuerySchema,
    responses: { 200: vehicleMakesResponseSchema },
  },
  'GET /api/vehicles/models': {
    tag: 'vehicles',
    summary: 'Models of a year and make',
    query: vehicleModelsQuerySchema,
    responses: { 200: vehicleModelsResponseSchema },
  },
  'GET /api/vehicles/engines': {
    tag: 'vehicles',
    summary: 'Engines of a year, make and model',
    query: vehicleEnginesQuerySchema,
    responses: { 200: vehicleEnginesResponseSchema },
  },
  'GET /api/engines/:id': {
    tag: 'vehicles',
    summary: 'An engine with its fitted coil and plug',
    description:
      "Stock count and bin at the reader's store, then the other stores' counts, for the store's staff; a technician sees in stock yes/no. Among the parts of one position, those in stock here come first. Cost and margin for buyers and admins only. \"Here\" is the signed-in person's home store; for an API key (no home store) the `location` parameter, else the chain's first store.",
    params: idParamSchema,
    query: locationQuerySchema,
    responses: { 200: engineDetailSchema },
  },
  'GET /api/engines/:id/alternates': {
    tag: 'vehicles',
    summary: "Our parts ranked against an engine's fitted coil or plug",
    description: "Ranked by verdict, then closeness, then in stock at the reader's store, then price; no-go candidates only with `all=1`.",
    params: idParamSchema,
    query: alternatesQuerySchema,
    responses: { 200: alternatesResponseSchema },
  },

  'GET /api/search': {
    tag: 'search',
    summary: 'Find parts by any number, a GTIN, words or spec',
    description: "A number is looked up exactly first (ours, another brand's, superseded); typos and free text go to the search index.",
    query: searchQuerySchema,
    responses: { 200: searchResponseSchema },
    errors: [503],
  },
  'GET /api/parts/:id': {
    tag: 'parts',
    summary: 'A part: spec, interchange (each claim judged), supersession, stock and prices',
    description:
      "Stock: `here` (the reader's store: on hand and bin) and `elsewhere` (the other stores holding some). \"Here\" is the signed-in person's home store; for an API key or anyone without one, the `location` parameter, else the chain's first store.",
    params: idParamSchema,
    query: partQuerySchema,
    responses: { 200: partDetailSchema },
  },
  'POST /api/parts': {
    tag: 'parts',
    summary: 'Add a part',
    body: createPartBodySchema,
    responses: { 201: partDetailSchema },
    errors: [409],
  },
  'PATCH /api/parts/:id': {
    tag: 'parts',
    summary: "Change a part's description, status, GTIN, successor or spec",
    params: idParamSchema,
    body: updatePartBodySchema,
    responses: { 200: partDetailSchema },
    errors: [409],
  },
  'GET /api/brands': { tag: 'brands', summary: 'Brands with their heat-code tables', responses: { 200: brandsResponseSchema } },
  'POST /api/brands': {
    tag: 'brands',
    summary: 'Add a brand',
    body: createBrandBodySchema,
    responses: { 201: brandResponseSchema },
    errors: [409],
  },
  'POST /api/interchange': {
    tag: 'interchange',
    summary: "Claim another brand's number equivalent to one of our parts",
    body: createInterchangeBodySchema,
    responses: { 201: interchangeResponseSchema },
    errors: [409],
  },

  'POST /api/compat/coil': {
    tag: 'compare',
    summary: 'Compare a substitute coil with the original on an engine',
    body: coilCompareBodySchema,
    responses: { 200: compatResultSchema },
  },
  'POST /api/compat/plug': {
    tag: 'compare',
    summary: 'Compare a substitute plug with the original on an engine',
    body: plugCompareBodySchema,
    responses: { 200: compatResultSchema },
  },
  'POST /api/bench/coil': {
    tag: 'bench',
    summary: "Hold a coil's measured resistances against its windows",
    description: 'Readings are corrected to 20 °C for copper before they are judged.',
    body: benchBodySchema,
    responses: { 200: benchResultSchema },
  },

  'GET /api/fit-reports': {
    tag: 'fit reports',
    summary: 'Fit reports, newest first',
    description: '`q` finds words in the title, note, vehicle, part numbers and engine; archived reports only with `archived=include`.',
    query: fitReportsQuerySchema,
    responses: { 200: fitReportsResponseSchema },
  },
  'PATCH /api/fit-reports/:id': {
    tag: 'fit reports',
    summary: 'Archive or restore a fit report',
    params: idParamSchema,
    body: updateFitReportBodySchema,
    responses: { 200: fitReportResponseSchema },
  },
  'POST /api/fit-reports': {
    tag: 'fit reports',
    summary: 'Save a comparison as a fit report',
    description: 'The verdict is recomputed on the server from the inputs.',
    body: fitReportBodySchema,
    responses: { 201: fitReportResponseSchema },
  },
  'GET /api/fit-reports/:id': {
    tag: 'fit reports',
    summary: 'A fit report',
    params: idParamSchema,
    responses: { 200: fitReportResponseSchema },
  },
  'POST /api/fit-reports/:id/email': {
    tag: 'fit reports',
    summary: 'E-mail a fit report with its share link',
    params: idParamSchema,
    body: emailFitReportBodySchema,
    responses: { 202: emailSentResponseSchema },
  },
  'GET /api/shared/fit-reports/:token': {
    tag: 'fit reports',
    summary: 'A fit report by its share link (read-only, no sign-in, no staff name)',
    params: shareTokenParamSchema,
    responses: { 200: sharedFitReportResponseSchema },
  },

  'GET /api/settings': {
    tag: 'settings',
    summary: "The model's thresholds and the price-list limits",
    responses: { 200: settingsResponseSchema },
  },
  'PUT /api/settings': {
    tag: 'settings',
    summary: 'Change the settings',
    body: updateSettingsBodySchema,
    responses: { 200: settingsResponseSchema },
  },

  'GET /api/suppliers': {
    tag: 'suppliers',
    summary: 'Suppliers with their last committed price list',
    description: 'Archived suppliers only with `archived=include`.',
    query: suppliersQuerySchema,
    responses: { 200: suppliersResponseSchema },
  },
  'POST /api/suppliers': {
    tag: 'suppliers',
    summary: 'Add a supplier',
    body: createSupplierBodySchema,
    responses: { 201: supplierResponseSchema },
    errors: [409],
  },
  'PATCH /api/suppliers/:id': {
    tag: 'suppliers',
    summary: 'Change, archive or restore a supplier, or its remembered column mapping',
    params: idParamSchema,
    body: updateSupplierBodySchema,
    responses: { 200: supplierResponseSchema },
    errors: [409],
  },
  'GET /api/sell-price-rules': {
    tag: 'suppliers',
    summary: "The sell-price rule: each brand's preferred supplier, or the lowest list price",
    responses: { 200: sellPriceRulesResponseSchema },
  },
  'PUT /api/sell-price-rules/:id': {
    tag: 'suppliers',
    summary: "Prefer a supplier's price for a brand, or (null) sell at the lowest list price",
    params: idParamSchema,
    body: setSellPriceRuleBodySchema,
    responses: { 200: sellPriceRuleResponseSchema },
    errors: [409],
  },

  'GET /api/price-lists': {
    tag: 'price lists',
    summary: 'Price-list history, newest first',
    query: priceListHistoryQuerySchema,
    responses: { 200: priceListHistorySchema },
  },
  'POST /api/price-lists': {
    tag: 'price lists',
    summary: "Upload a supplier's CSV: read, check, stage and compare it with the catalog",
    description:
      'A whole-file refusal is a 400, 413 or 415 whose `error.details.reason` says why. With `uploadId`, `GET /api/price-lists/{id}` shows the progress meanwhile.',
    form: { fields: uploadPriceListFieldsSchema, file: PRICE_LIST_UPLOAD_FIELD },
    responses: { 201: priceListSchema },
    errors: [404, 409, 413, 415],
  },
  'GET /api/price-lists/:id': { tag: 'price lists', summary: 'A price list', params: idParamSchema, responses: { 200: priceListSchema } },
  'GET /api/price-lists/:id/changes': {
    tag: 'price lists',
    summary: 'The preview: new parts, price changes, supersessions',
    params: idParamSchema,
    query: priceListChangesQuerySchema,
    responses: { 200: priceListChangesSchema },
  },
  'GET /api/price-lists/:id/errors': {
    tag: 'price lists',
    summary: 'Rejected rows with their reasons',
    params: idParamSchema,
    query: priceListErrorsQuerySchema,
    responses: { 200: priceListErrorsSchema },
  },
  'GET /api/price-lists/:id/errors.csv': {
    tag: 'price lists',
    summary: 'Rejected rows as CSV',
    description: 'Cells that a spreadsheet would read as a formula are escaped.',
    params: idParamSchema,
    responses: { 200: 'csv' },
  },
  'POST /api/price-lists/:id/preview': {
    tag: 'price lists',
    summary: 'Compare a staged list again, or read it again with another mapping',
    params: idParamSchema,
    body: previewPriceListBodySchema,
    responses: { 200: priceListSchema },
    errors: [409, 413],
  },
  'POST /api/price-lists/:id/commit': {
    tag: 'price lists',
    summary: 'Write a staged list into the catalog, in one transaction',
    params: idParamSchema,
    responses: { 200: commitPriceListResponseSchema },
    errors: [409],
  },
  'POST /api/price-lists/:id/discard': {
    tag: 'price lists',
    summary: 'Discard a staged list',
    params: idParamSchema,
    responses: { 200: priceListSchema },
    errors: [409],
  },
} satisfies Record<RouteKey, RouteDoc>;
