import { z } from "zod";

/** Body of POST /api/designs/evaluate: the design file itself, or `{ design, curves? }`. */
export const evaluateDesignBodySchema = z.object({
  design: z.unknown(),
  curves: z.boolean().optional(),
});
