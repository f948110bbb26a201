/** One library entry: a hazard row of the content schema without its id, shared by the admin form and the server. */
import { z } from "zod";
import { hazardSchema } from "../method-statement/content";

export const libraryEntrySchema = hazardSchema.omit({ id: true }).extend({
  controls: hazardSchema.shape.controls.min(1, "Add at least one control"),
});
export type LibraryEntryInput = z.infer<typeof libraryEntrySchema>;

/** A library entry as read: the hazard with the library's own id. */
export type LibraryEntry = LibraryEntryInput & { id: string };
