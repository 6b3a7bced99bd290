import { z } from "zod";

// The pages' Content-Security-Policy has no 'unsafe-eval', so zod cannot compile its fast object
// parsers in the browser. Telling it up front stops its Function("") probe, which Chromium reports
// as a policy violation; parsing is the same as zod's own fallback after a refused probe.
z.config({ jitless: true });
