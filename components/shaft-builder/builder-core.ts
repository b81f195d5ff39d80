/**
 * The builder's use of the engineering core: checking the form (the core's parser), evaluating it
 * (the core's evaluateDesign) and the form a saved draft opens as. Pure, no React, so the same
 * functions run on the server (the page's first results) and in the browser (live results).
 *
 * The browser loads this module on demand (`load-builder-core.ts`): the page arrives with the
 * first results computed on the server, and the core follows at the first edit, so the builder's
 * first load does not carry the engineering core.
 */
import { zodResolver } from "@hookform/resolvers/zod";
import type { Resolver } from "react-hook-form";
import { z } from "zod";
import type { Catalogue, ShopSettings, TubePreference } from "@/lib/driveline";
import { DesignInputError, evaluateDesign } from "@/lib/driveline/evaluate";
import { parseDesign } from "@/lib/driveline/schema";
import type { DraftView } from "@/lib/designs/drafts";
import { designApplicationSchema, designNameSchema } from "@/lib/designs/schemas";
import {
  defaultBuilderForm,
  designFileToForm,
  formPathOf,
  formToDesignFile,
  type BuilderForm,
  type Evaluation,
  type FormValidation,
} from "./model";

export { parseDesign };

/** What the evaluation needs from the shop (plain objects from getShopEngineering()). */
export interface BuilderShop {
  catalogue: Catalogue;
  settings: ShopSettings;
  tubePreference: TubePreference;
}

/** The part of the shop's configuration (getShopEngineering()) the builder's evaluation reads. */
export function builderShopOf(shop: {
  catalogue: Catalogue;
  settings: ShopSettings;
  priceBook: { tubePreference: TubePreference };
}): BuilderShop {
  return {
    catalogue: shop.catalogue,
    settings: shop.settings,
    tubePreference: shop.priceBook.tubePreference,
  };
}

/** Validates the form by parsing its design file with the core (the core's rules, not ours). */
export function validateBuilderForm(form: BuilderForm, catalogue: Catalogue): FormValidation {
  const parsed = parseDesign(formToDesignFile(form), { catalogue });
  if (parsed.ok) return { design: parsed.design, fieldErrors: {}, issues: [] };
  const fieldErrors: Record<string, string> = {};
  for (const issue of parsed.issues) fieldErrors[formPathOf(issue.path)] ??= issue.message;
  return { design: null, fieldErrors, issues: parsed.issues };
}

/**
 * The zod schema of the whole form for react-hook-form: the name and application by their own
 * schemas, the engineering fields by the core's parseDesign.
 */
export function builderFormSchema(catalogue: Catalogue) {
  return z
    .object({ name: designNameSchema, application: designApplicationSchema })
    .passthrough()
    .superRefine((value, ctx) => {
      const { issues } = validateBuilderForm(value as unknown as BuilderForm, catalogue);
      for (const issue of issues)
        ctx.addIssue({ code: "custom", path: formPathOf(issue.path).split("."), message: issue.message });
    });
}

/** react-hook-form's resolver for the builder (builderFormSchema). */
export function builderResolver(catalogue: Catalogue): Resolver<BuilderForm> {
  return zodResolver(builderFormSchema(catalogue)) as unknown as Resolver<BuilderForm>;
}

/** The results for a valid form (null while it has errors); the options the builder always uses. */
export function evaluateBuilderForm(validation: FormValidation, shop: BuilderShop): Evaluation | null {
  if (!validation.design) return null;
  try {
    return {
      design: validation.design,
      report: evaluateDesign(validation.design, {
        catalogue: shop.catalogue,
        settings: shop.settings,
        tubePreference: shop.tubePreference,
        curves: { points: 181 },
        alternatives: true,
      }),
    };
  } catch (error) {
    if (error instanceof DesignInputError) return null;
    throw error;
  }
}

/** The form a saved draft opens as (a new design without one). */
export function initialForm(draft: DraftView | null | undefined): BuilderForm {
  if (!draft) return defaultBuilderForm();
  const parsed = parseDesign(draft.design);
  const form = parsed.ok
    ? designFileToForm(parsed.design, { application: draft.application })
    : { ...defaultBuilderForm(), application: draft.application };
  return { ...form, name: draft.name };
}

/** Where the builder starts: its form, that form's check and results (computed on the server). */
export interface BuilderStart {
  form: BuilderForm;
  validation: FormValidation;
  evaluation: Evaluation | null;
}

/** The builder's starting point for a draft (or a new design), for the page to pass as a prop. */
export function builderStart(draft: DraftView | null | undefined, shop: BuilderShop): BuilderStart {
  const form = initialForm(draft);
  const validation = validateBuilderForm(form, shop.catalogue);
  return { form, validation, evaluation: evaluateBuilderForm(validation, shop) };
}
