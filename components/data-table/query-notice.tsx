import { Alert } from "@/components/ui/alert";
import type { ParamProblem } from "@/lib/tables/params";

/** Names the parts of a link the table could not use (each fell back to its default). */
export function QueryNotice({ problems }: { problems: ParamProblem[] }) {
  if (!problems.length) return null;
  return (
    <div className="no-print mb-4">
      <Alert tone="warning" title="Part of this link was not understood, so the default is used instead:">
        <ul className="list-disc pl-5">
          {problems.map((p) => (
            <li key={p.field}>
              <code>{p.field}</code> {p.message}
            </li>
          ))}
        </ul>
      </Alert>
    </div>
  );
}
