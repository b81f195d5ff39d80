import { z } from "zod";

// Runs before the app's browser code. zod 4 probes `new Function("")` to compile parsers, which
// the content security policy blocks (and reports) by design: parse without compiling instead.
z.config({ jitless: true });
