import { z } from "zod";

/** Ids in Plumbline are UUIDs (v7 for rows we make, v4 from Auth.js). */
export const idSchema = z.uuid({ message: "Not a valid id" });
