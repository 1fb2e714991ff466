import { z } from "zod";
import { idSchema } from "../http/id-schema";

/** Path segments of the garage's car routes. */
export const carParams = z.object({ carId: idSchema });
export const carFileParams = z.object({ carId: idSchema, fileId: idSchema });
