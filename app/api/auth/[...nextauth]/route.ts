// GET/POST /api/auth/* — Auth.js sign-in, callback, session and sign-out endpoints.
import { handlers } from "@/auth";

export const { GET, POST } = handlers;
