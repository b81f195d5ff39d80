/** Prints the README's engineering limits table (see lib/catalogue/limits-table.ts). */
import { engineeringLimitsMarkdown } from "@/lib/catalogue/limits-table";

process.stdout.write(`${engineeringLimitsMarkdown()}\n`);
