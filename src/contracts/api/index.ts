/**
 * The HTTP API's contracts, shared by the server (which validates every request with them) and the
 * web client (which parses every response with them). Routes and roles: docs/api.md.
 */
export * from './errors';
export * from './common';
export * from './account';
export * from './workspaces';
export * from './members';
export * from './invitations';
export * from './fixtures';
export * from './measurements';
export * from './scenarios';
export * from './result';
export * from './admin';
export * from './snapshots';
