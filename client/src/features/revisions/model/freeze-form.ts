import { createRevisionRequestSchema, createReviewRequestSchema } from '@channelwright/shared/schemas';
import { z } from 'zod';

/** The freeze dialog: the revision's message, and optionally the review request sent with it. */
export const freezeFormSchema = z
  .object({
    message: createRevisionRequestSchema.shape.message,
    askReview: z.boolean(),
    reviewerId: z.string().nullable(),
    note: z.string().trim().max(2000, 'note must have at most 2000 characters'),
  })
  .superRefine((value, ctx) => {
    if (value.askReview && !value.reviewerId) ctx.addIssue({ code: 'custom', path: ['reviewerId'], message: 'Choose who reviews it, or untick the review' });
  });
export type FreezeFormValues = z.input<typeof freezeFormSchema>;

/** The review request the form asks for, in the shape the API validates. */
export const reviewRequestOf = (values: FreezeFormValues) => createReviewRequestSchema.parse({ reviewerId: values.reviewerId, note: values.note });
