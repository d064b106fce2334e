import { z } from "zod";

// Request bodies of the sites API, shared by the route handlers, the site forms and the OpenAPI document.

const name = (message: string) => z.string().trim().min(1, message).max(200, "at most 200 characters");
/** Rooms and areas are named in the device schedule too, whose columns hold 120 characters. */
const placeName = (message: string) => z.string().trim().min(1, message).max(120, "at most 120 characters");
const nodeId = z.number().int().positive().optional();

export const roomNodeSchema = z.strictObject({ id: nodeId, name: placeName("Name the room") });
export const areaNodeSchema = z.strictObject({ id: nodeId, name: placeName("Name the area"), rooms: z.array(roomNodeSchema).max(500).default([]) });
export const floorNodeSchema = z.strictObject({ id: nodeId, name: name("Name the floor"), areas: z.array(areaNodeSchema).max(200).default([]) });
export type RoomNode = z.infer<typeof roomNodeSchema>;
export type AreaNode = z.infer<typeof areaNodeSchema>;
export type FloorNode = z.infer<typeof floorNodeSchema>;

const key = (s: string) => s.trim().toLowerCase();

/**
 * The ordered floors of a site. A detector names its area and room, so area names are unique in the site and room
 * names unique in their area (letter case ignored); floor names are unique too, to keep the list readable.
 */
export const floorsSchema = z
  .array(floorNodeSchema)
  .max(100)
  .superRefine((floors, ctx) => {
    const floorsSeen = new Set<string>();
    const areasSeen = new Set<string>();
    floors.forEach((f, i) => {
      if (floorsSeen.has(key(f.name))) ctx.addIssue({ code: "custom", path: [i, "name"], message: `another floor is already called ${f.name}` });
      floorsSeen.add(key(f.name));
      f.areas.forEach((a, j) => {
        if (areasSeen.has(key(a.name))) ctx.addIssue({ code: "custom", path: [i, "areas", j, "name"], message: `another area of the site is already called ${a.name}` });
        areasSeen.add(key(a.name));
        const roomsSeen = new Set<string>();
        a.rooms.forEach((r, k) => {
          if (roomsSeen.has(key(r.name))) ctx.addIssue({ code: "custom", path: [i, "areas", j, "rooms", k, "name"], message: `${a.name} already has a room called ${r.name}` });
          roomsSeen.add(key(r.name));
        });
      });
    });
  });

/** The older shape of a structure: a flat list of areas with room names. Each becomes a floor of its name holding one area. */
export const legacyAreaSchema = z.strictObject({ name: placeName("Name the floor or area"), rooms: z.array(placeName("Name the room")).max(500).default([]) });

const email = z.union([z.literal(""), z.email("not an e-mail address").max(254)]);

/** A site's details as the form edits them (no defaults, so an update can leave any out). */
const detailFields = {
  name: name("Name the site"),
  address: z.string().trim().max(500, "at most 500 characters"),
  description: z.string().trim().max(5000, "at most 5000 characters"),
  contactName: z.string().trim().max(200, "at most 200 characters"),
  contactPhone: z
    .string()
    .trim()
    .max(60, "at most 60 characters")
    .regex(/^[0-9+()./\s-]*$/, "digits, spaces and + ( ) - . / only"),
  contactEmail: email,
  notes: z.string().trim().max(10000, "at most 10000 characters"),
  /** EN 50131-1 security grade; null or absent: not chosen yet. */
  securityGrade: z.number().int("the security grade is 1 to 4").min(1, "the security grade is 1 to 4").max(4, "the security grade is 1 to 4").nullable().optional(),
};

/** The site form: the details without the structure (edited on its own). */
export const siteDetailsSchema = z.strictObject(detailFields);
export type SiteDetails = z.infer<typeof siteDetailsSchema>;

export const siteInputSchema = z
  .strictObject({
    name: detailFields.name,
    address: detailFields.address.default(""),
    description: detailFields.description.default(""),
    contactName: detailFields.contactName.default(""),
    contactPhone: detailFields.contactPhone.default(""),
    contactEmail: email.default(""),
    notes: detailFields.notes.default(""),
    securityGrade: detailFields.securityGrade,
    floors: floorsSchema.optional(),
    areas: z.array(legacyAreaSchema).max(200).optional(),
  })
  .refine((s) => !(s.floors && s.areas), { message: "send floors or areas, not both", path: ["areas"] });
export type SiteInput = z.infer<typeof siteInputSchema>;

export const siteUpdateSchema = z
  .strictObject({ ...detailFields, installerUserIds: z.array(z.number().int().positive()).max(50) })
  .partial()
  .refine((p) => Object.values(p).some((v) => v !== undefined), "nothing to change");
export type SiteUpdate = z.infer<typeof siteUpdateSchema>;

export const siteStructureSchema = z.strictObject({ floors: floorsSchema });
export type SiteStructureInput = z.infer<typeof siteStructureSchema>;

/** "Add a new room" beside a detector's room list. */
export const addRoomSchema = z.strictObject({ areaId: z.number().int().positive(), name: placeName("Name the room") });
export type AddRoomInput = z.infer<typeof addRoomSchema>;

/** A new site holding a copy of another's structure and device schedule. */
export const siteCopySchema = z.strictObject({ name: name("Name the new site"), address: z.string().trim().max(500, "at most 500 characters").default("") });
export type SiteCopyInput = z.infer<typeof siteCopySchema>;

export const siteListQuerySchema = z.object({ archived: z.enum(["include", "only", "exclude"]).default("exclude") });
