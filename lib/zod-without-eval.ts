import { z } from "zod";

// In the browser and the service worker, zod checks whether it may compile parsers with
// `Function("")`; under Plumbline's content security policy (no 'unsafe-eval') that probe is a
// policy violation, reported every time a page loads. Tell zod not to compile: it parses the
// same, without the probe. Imported before any schema is made (instrumentation-client.ts, app/sw.ts).
z.config({ jitless: true });
