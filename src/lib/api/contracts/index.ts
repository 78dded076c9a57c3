/**
 * The /api/v1 contract: the zod schema of every request and response, and the types inferred from them.
 * Endpoints parse with these, services return these types, islands read their types from here, and
 * /api/v1/openapi.json is generated from them. Isomorphic: nothing here imports the server.
 */
export * from './common';
export * from './errors';
export * from './designs';
export * from './revisions';
export * from './shares';
export * from './members';
export * from './invitations';
export * from './measurements';
export * from './attachments';
export * from './me';
export * from './solve';
export * from './design-files';
export * from './reports';
export * from './winding';
export * from './groups';
export * from './reviews';
