/**
 * A typed client for the Memberproof HTTP API: openapi-fetch over the types that openapi-typescript
 * generates from openapi/openapi.json (schema.d.ts beside this file, never edited by hand).
 *
 * Example:
 *   const client = createMemberproofClient('http://127.0.0.1:3000');
 *   const { data, error } = await client.POST('/v1/member-checks', { body });
 *   // data: MemberCheckResponse on a 2xx; error: Problem (RFC 9457) on a 4xx or 5xx.
 */

import createClient, { type Client, type ClientOptions } from 'openapi-fetch';
import type { components, operations, paths } from './schema.js';

export type { components, operations, paths };

/** A fetch that openapi-fetch can call: it hands over one Request. */
export type MemberproofFetch = NonNullable<ClientOptions['fetch']>;

export type MemberproofClient = Client<paths>;

export type MemberCheckRequest = components['schemas']['MemberCheckRequest'];
export type MemberCheckResponse = components['schemas']['MemberCheckResponse'];
export type Problem = components['schemas']['Problem'];

/**
 * A client whose paths, bodies and answers are typed by the contract. baseUrl is the service's root
 * ("http://127.0.0.1:3000", without /v1; a trailing slash is dropped); fetchImpl replaces globalThis.fetch (a test double, a
 * proxy agent).
 */
export function createMemberproofClient(baseUrl: string, fetchImpl?: MemberproofFetch): MemberproofClient {
  return createClient<paths>({
    baseUrl,
    ...(fetchImpl === undefined ? {} : { fetch: fetchImpl }),
  });
}
