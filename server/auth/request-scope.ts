import { AsyncLocalStorage } from 'node:async_hooks';

/** Facts about the HTTP request that Auth.js callbacks cannot see themselves (they get a rebuilt web Request). */
export interface RequestScope {
  ip: string | undefined;
}

export const requestScope = new AsyncLocalStorage<RequestScope>();

/** The client address of the request being handled, for the audit log. */
export function currentIp(): string | null {
  return requestScope.getStore()?.ip ?? null;
}
