import { z } from "zod";
import { VIEWS } from "@/lib/marks/types";

/** What the browser or the capture computer says about a file before sending it. */
export const clipCreateSchema = z.object({
  fittingId: z.string().uuid(),
  buildId: z.string().uuid(),
  view: z.enum(VIEWS),
  fileName: z.string().trim().min(1).max(255),
  contentType: z.string().trim().regex(/^[\w.+-]+\/[\w.+-]+$/, "must be a MIME type such as video/mp4").max(100),
  sizeBytes: z.number().int().min(0),
  captureFps: z.number().positive().max(10_000).optional(),
  slowMotionFactor: z.number().min(1).max(64).optional(),
  strokeId: z.string().uuid().optional(),
  consentConfirmed: z.boolean().optional(),
  // SHA-256 of the file (hex): a second file with the same content is answered with the first clip.
  contentSha256: z.string().regex(/^[0-9a-fA-F]{64}$/, "must be a SHA-256 in hex (64 characters)").transform((v) => v.toLowerCase()).optional(),
});

export const clipListQuery = z.object({ fittingId: z.string().uuid() });

const partNumber = z.number().int().min(1).max(10_000);

/** Presigned PUTs for parts of a large file; without `uploadId` a multipart upload is started. */
export const clipPartsSchema = z.object({
  uploadId: z.string().trim().min(1).max(1024).optional(),
  partNumbers: z.array(partNumber).min(1).max(100),
});

/** Completion; a file sent in parts names its upload and every part's ETag. */
export const clipCompleteSchema = z.object({
  uploadId: z.string().trim().min(1).max(1024).optional(),
  parts: z.array(z.object({ partNumber, etag: z.string().trim().min(1).max(200) })).min(1).max(10_000).optional(),
}).refine((v) => (v.uploadId === undefined) === (v.parts === undefined), "uploadId and parts go together");
