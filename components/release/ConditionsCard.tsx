import { Card } from "@/components/ui/card";
import type { ConditionsDto } from "@/models/release/dto";
import { StepForm } from "./StepForm";

/** The conditions of the approval as noted and how the studio will meet each. */
export function ConditionsCard({ commissionId, data, released }: { commissionId: number; data: ConditionsDto; released: boolean }) {
  if (!data.decision) return null;
  return (
    <Card title={`Conditions of the approval of Revision ${data.decision.number}`}>
      <ol className="grid list-decimal gap-3 pl-5">
        {data.conditions.map((c) => (
          <li key={c.index}>
            <p className="whitespace-pre-wrap font-medium">{c.text}</p>
            {c.answer ? <p className="whitespace-pre-wrap text-sm">How it will be met ({c.answeredByName}): {c.answer}</p> : <p className="text-sm text-ink-soft">Not answered yet.</p>}
            {data.you.mayAnswer && !released && (
              <details className="mt-1">
                <summary className="min-h-11 cursor-pointer py-2">{c.answer ? "Change the answer" : "Answer this condition"}</summary>
                <StepForm id={`cond-${c.index}`} url={`/api/commissions/${commissionId}/conditions/${c.index + 1}`} submit="Save the answer"
                  fields={[{ name: "answer", label: "How the studio will meet it", kind: "textarea" }]} />
              </details>
            )}
          </li>
        ))}
      </ol>
    </Card>
  );
}
