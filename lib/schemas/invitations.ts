// Invitations by e-mail: what staff send and what the invited person sends back.
import { z } from "zod";

export const INVITATION_DAYS = 7;

export const invitationCreateSchema = z
  .object({
    role: z.enum(["golfer", "coach"]),
    email: z.string().trim().toLowerCase().email("Enter a valid e-mail address").max(254),
    name: z.string().trim().min(1, "Enter a name").max(120).optional(),
    // A golfer invitation is for this golfer; a coach invitation shares this golfer on acceptance.
    golferId: z.string().uuid().optional(),
  })
  .strict()
  .refine((v) => v.role !== "golfer" || v.golferId, { message: "A golfer invitation needs golferId", path: ["golferId"] })
  .refine((v) => v.role !== "coach" || v.name, { message: "Enter the coach's name", path: ["name"] });

export const invitationAcceptSchema = z
  .object({
    token: z.string().min(20).max(200),
    password: z.string().min(10, "Use at least 10 characters").max(200),
  })
  .strict();

export const coachGrantSchema = z.object({ coachUserId: z.string().uuid() }).strict();

export type InvitationCreate = z.infer<typeof invitationCreateSchema>;
