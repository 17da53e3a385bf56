import { z } from 'zod';

/**
 * Row ids are UUIDs. `z.guid()` accepts any 8-4-4-4-12 hex id (also fixed
 * demo ids that do not carry RFC 4122 version bits).
 */
export const idSchema = z.guid();

/** Timestamps travel as ISO 8601 strings (`Date#toJSON`, offset allowed). */
export const isoDateTimeSchema = z.iso.datetime({ offset: true });
