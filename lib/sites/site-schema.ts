import { z } from "zod";

export const areaInputSchema = z.strictObject({
  name: z.string().trim().min(1, "Name the floor or area").max(200),
  rooms: z.array(z.string().trim().min(1).max(200)).max(500).default([]),
});

export const siteInputSchema = z.strictObject({
  name: z.string().trim().min(1, "Name the site").max(200),
  address: z.string().trim().max(500).default(""),
  description: z.string().trim().max(5000).default(""),
  areas: z.array(areaInputSchema).max(200).default([]),
});
export type SiteInput = z.infer<typeof siteInputSchema>;

export const siteUpdateSchema = z.strictObject({
  name: z.string().trim().min(1, "Name the site").max(200).optional(),
  address: z.string().trim().max(500).optional(),
  description: z.string().trim().max(5000).optional(),
  installerUserId: z.number().int().positive().nullable().optional(),
});
