// Runs in the browser before the app's own code (Next's client instrumentation hook).
import "./lib/zod-without-eval";
