/** The RFC 9457 problem body every error response has. */

import { z } from './zod.js';

export const problemOutput = z
  .object({
    type: z.string().openapi({ description: 'A URI reference that identifies the problem type.' }),
    title: z.string().openapi({ description: 'A short summary of the problem type.' }),
    status: z.number().int().openapi({ description: 'The HTTP status code.' }),
    detail: z.string().openapi({ description: 'What went wrong with this request.' }),
    instance: z.string().optional().openapi({ description: 'The request path.' }),
    errors: z
      .array(
        z.object({
          pointer: z.string().openapi({ description: 'RFC 6901 JSON pointer into the request body ("/loads/2/position").' }),
          message: z.string().openapi({ description: 'What is wrong with that field.' }),
        }),
      )
      .optional()
      .openapi({ description: 'The fields at fault, for invalid input.' }),
    nearest: z.array(z.string()).optional().openapi({ description: 'For an unknown designation or grade: the nearest catalogue names.' }),
  })
  .catchall(z.unknown())
  .openapi('Problem', { description: 'RFC 9457 problem details.' });
