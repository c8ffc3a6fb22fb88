/** POST /v1/member-reports and /v1/member-diagrams: a member check's request, answered as an HTML record or an SVG figure. */

import { MEMBER_CHECK_EXAMPLE, memberCheckFields } from './member-check-request.js';
import { z } from './zod.js';

export const reportMeta = z
  .strictObject({
    title: z.string().min(1).max(200).openapi({ description: 'The job title printed at the head of the record.' }),
    reference: z.string().min(1).max(100).openapi({ description: 'The job or quote reference.' }),
    preparedBy: z.string().min(1).max(100).optional().openapi({ description: 'Who prepared the check.' }),
  })
  .openapi('ReportMeta', { description: 'What the record is for; printed escaped.' });

export const memberReportRequest = z
  .strictObject({ ...memberCheckFields, report: reportMeta })
  .openapi('MemberReportRequest', {
    description: 'A member check (as POST /v1/member-checks takes it) and the job it belongs to.',
    example: { ...MEMBER_CHECK_EXAMPLE, report: { title: 'Work platform WP-12, joist J3', reference: 'Q-2026-0412', preparedBy: 'A. Engineer' } },
  });

export const MEMBER_REPORT_EXAMPLE = { ...MEMBER_CHECK_EXAMPLE, report: { title: 'Work platform WP-12, joist J3', reference: 'Q-2026-0412', preparedBy: 'A. Engineer' } };

export const htmlDocument = z.string().openapi('HtmlDocument', {
  description: 'A self-contained HTML page (no external assets, no script), printable on A4: the job, the verdict and governing check, the inputs in the requested units, the figure, every check with its formula and source, the combinations, every notice and the caution, the engine version and the input digest.',
});

export const svgDocument = z.string().openapi('SvgDocument', {
  description: 'One SVG figure: the member with its supports and loads to scale, then the shear-force, bending-moment and deflection panels in each plane (and axial force, torque and twist) where not zero, extremes labelled with value, unit and position, jumps drawn as jumps.',
});

export type MemberReportRequest = z.infer<typeof memberReportRequest>;
