/** Record ids are UUIDs: anything else names no record, and is answered "not found" before a query. */
import { z } from "zod";

const uuid = z.uuid();

export const isUuid = (value: unknown): value is string => uuid.safeParse(value).success;
