/** POST /v1/member-checks/batch: many member checks in one request, each answered on its own. */

import { MEMBER_CHECK_EXAMPLE, memberCheckFields } from './member-check-request.js';
import { memberCheckResponse, notices } from './member-check-response.js';
import { problemOutput } from './problem.js';
import { z } from './zod.js';

export const MAX_BATCH_ITEMS = 1000;

export const batchItem = z
  .strictObject({
    ...memberCheckFields,
    id: z
      .union([z.string().min(1).max(128), z.number().int()])
      .optional()
      .openapi({ description: "The caller's own reference for the item (a quote line, a configuration id), echoed with its result." }),
  })
  .openapi('BatchItem', { description: 'A member-check request with an optional id.' });

export const batchRequest = z
  .strictObject({
    items: z
      .array(batchItem)
      .min(1)
      .max(MAX_BATCH_ITEMS)
      .openapi({ description: `1 to ${MAX_BATCH_ITEMS} member checks; more is a 413 problem. Each is checked on its own: one bad item never fails the batch. Set output.samples low to keep the answer small.` }),
  })
  .openapi('BatchRequest');

/** The envelope alone: each item is then parsed on its own, so its errors stay its own. */
export const batchEnvelope = z.strictObject({ items: z.array(z.unknown()).min(1) });

/** Two shelf-beam configurations of a fictional shelving maker, one of them with a typing error. */
export const BATCH_EXAMPLE = {
  items: [
    { id: 'quote-1042/bay-1', ...MEMBER_CHECK_EXAMPLE, output: { samples: 3 } },
    { id: 'quote-1042/bay-2', ...MEMBER_CHECK_EXAMPLE, section: { designation: 'IPE 220' }, output: { samples: 3 } },
  ],
};

export const batchResult = z
  .object({
    index: z.number().int().openapi({ description: 'Position of the item in the request.' }),
    id: z.union([z.string(), z.number()]).optional().openapi({ description: 'The id the item gave.' }),
    status: z.number().int().openapi({ description: 'What the single check would have answered: 200, or the problem status.' }),
    result: memberCheckResponse.optional().openapi({ description: 'With status 200: the member-check result, equal to the single check.' }),
    error: problemOutput.optional().openapi({ description: 'Otherwise: the problem, with pointers rooted at /items/{index}.' }),
  })
  .openapi('BatchResult');

export const batchResponse = z
  .object({
    results: z.array(batchResult).openapi({ description: 'One per item, in request order.' }),
    summary: z
      .object({
        total: z.number().int().openapi({ description: 'Items in the batch.' }),
        pass: z.number().int().openapi({ description: 'Items checked with verdict pass.' }),
        fail: z.number().int().openapi({ description: 'Items checked with verdict fail.' }),
        notVerified: z.number().int().openapi({ description: 'Items checked with verdict not-verified: nothing failed, but a mode that applies was not evaluated.' }),
        error: z.number().int().openapi({ description: 'Items answered with a problem.' }),
        worstUtilization: z.number().optional().openapi({ description: 'The highest governing utilization among the checked items.' }),
        worstIndex: z.number().int().optional().openapi({ description: 'The item that has it.' }),
      })
      .openapi('BatchSummary'),
    notices,
  })
  .openapi('BatchResponse');
