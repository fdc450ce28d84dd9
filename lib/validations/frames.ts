import { z } from 'zod';
import { createCustomerBodySchema } from './customers';
import { findGeometryIssues, frameSchedulePanelSchema, frameUnitSchema } from '@/lib/frames';

/** A saved frame schedule: a name, who it is for, how lengths are shown, and its panels (may be none yet). */
export const saveFrameScheduleBodySchema = z
  .object({
    name: z
      .string({ error: 'Give the schedule a name, e.g. "lean-to for the Marsh garden"' })
      .trim()
      .min(1, { error: 'Give the schedule a name, e.g. "lean-to for the Marsh garden"' })
      .max(120, { error: 'Schedule name must be at most 120 characters' }),
    customerName: z
      .string()
      .trim()
      .max(120, { error: 'Customer name must be at most 120 characters' })
      .default(''),
    customerEmail: z
      .union([z.email({ error: 'Give an e-mail address like name@example.com' }), z.literal('')])
      .default(''),
    unit: frameUnitSchema.default('mm'),
    panels: z
      .array(frameSchedulePanelSchema, { error: 'Panels must be a list' })
      .max(100, { error: 'A frame schedule holds at most 100 panels' })
      .default([]),
  })
  .superRefine((body, ctx) => {
    for (const issue of findGeometryIssues(body.panels))
      ctx.addIssue({ code: 'custom', path: issue.path, message: issue.message });
  });
export type SaveFrameScheduleBody = z.output<typeof saveFrameScheduleBodySchema>;
export type SaveFrameScheduleBodyInput = z.input<typeof saveFrameScheduleBodySchema>;

const dueDateSchema = z.iso.date({ error: 'Due date must be a date like 2026-12-01' });

/** Send a schedule's cut list to an existing draft or planned job ({ jobId }), or to a new job ({ newJob }). */
export const sendScheduleToJobBodySchema = z
  .object({
    jobId: z
      .number({ error: 'Choose a job' })
      .int({ error: 'Choose a job' })
      .positive({ error: 'Choose a job' })
      .max(2_147_483_647, { error: 'Choose a job' })
      .optional(),
    newJob: z
      .object({
        // The new job's customer: a record, a record made with the job, or a name (found or made retail).
        customerId: z.number().int().positive().max(2_147_483_647).optional(),
        newCustomer: createCustomerBodySchema.optional(),
        customerName: z
          .string({ error: 'Give the customer name' })
          .trim()
          .min(1, { error: 'Give the customer name' })
          .max(120, { error: 'Customer name must be at most 120 characters' })
          .optional(),
        customerEmail: z
          .union([z.email({ error: 'Give an e-mail address like name@example.com' }), z.literal('')])
          .optional(),
        reference: z.string().trim().max(40, { error: 'Reference must be at most 40 characters' }).optional(),
        dueDate: z.union([dueDateSchema, z.literal('')]).optional(),
      })
      .refine(
        (j) => [j.customerId, j.newCustomer, j.customerName].filter((x) => x !== undefined).length === 1,
        { error: 'Choose a customer or enter a new one', path: ['customerId'] },
      )
      .optional(),
    // When the job already holds this schedule's pieces: swap them for the new set, or add another set.
    ifAlreadySent: z.enum(['replace', 'add'], { error: 'Choose replace or add' }).optional(),
  })
  .strict()
  .refine((body) => (body.jobId === undefined) !== (body.newJob === undefined), {
    error: 'Send to an existing job or to a new one (one of the two)',
    path: ['jobId'],
  });
export type SendScheduleToJobBody = z.output<typeof sendScheduleToJobBodySchema>;
export type SendScheduleToJobBodyInput = z.input<typeof sendScheduleToJobBodySchema>;
