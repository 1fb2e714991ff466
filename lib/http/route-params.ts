import { z } from "zod";
import { idSchema } from "./id-schema";

/** Path segments as the route handlers name them; every id is a UUID. */
export const eventParams = z.object({ eventId: idSchema });
export const entryParams = z.object({ entryId: idSchema });
export const eventVersionParams = z.object({ eventId: idSchema, versionId: idSchema });
export const eventRecordParams = z.object({ eventId: idSchema, recordId: idSchema });

/** The event a route's path names: the `eventId` of a route's access rule. */
export const pathEvent = ({ params }: { params: { eventId: string } }) => params.eventId;
