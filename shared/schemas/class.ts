import { z } from 'zod';

/** An enrolment row is active or withdrawn; "invited" is shown for invitations not yet accepted. */
export const EnrolmentStatus = z.enum(['active', 'withdrawn']);
export type EnrolmentStatus = z.infer<typeof EnrolmentStatus>;
