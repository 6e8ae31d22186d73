import { Card, HashText } from "@/components/ui/card";
import type { PermissionsDto } from "@/models/release/dto";
import { StepForm } from "./StepForm";

const RECORD_FIELDS = [
  { name: "authority", label: "Granted by (authority)" },
  { name: "reference", label: "Reference" },
  { name: "grantedOn", label: "Date granted", kind: "date" as const },
  { name: "conditions", label: "Its conditions (if any)", kind: "textarea" as const },
  { name: "file", label: "The document (PDF or photo)", kind: "file" as const },
];

/** The permissions the commission needs, what is recorded of each, and for the chair the forms to keep them. */
export function PermissionsCard({ commissionId, data, released }: { commissionId: number; data: PermissionsDto; released: boolean }) {
  const chair = data.you.mayRecord && !released;
  return (
    <Card title="Permissions">
      {!data.plan && <p className="mb-3">The chair has not yet said which outside permissions the commission needs.</p>}
      {data.plan?.noneRequired && <p className="mb-3">No outside permission is needed. The chair&apos;s reason: <span className="whitespace-pre-wrap">{data.plan.reason}</span></p>}
      <ul className="grid gap-3" aria-label="Permissions needed">
        {data.permissions.map((p) => (
          <li key={p.id} className="rounded-md border border-line p-3">
            <p className="font-semibold">{p.name}{p.authority && !p.recorded ? ` — from ${p.authority}` : ""}</p>
            {p.recorded ? (
              <div className="text-sm">
                <p>Granted by {p.authority} on {p.grantedOn}, reference {p.reference}.</p>
                {p.conditions && <p className="whitespace-pre-wrap">Conditions: {p.conditions}</p>}
                {p.document && <p><a href={p.document.url} className="min-h-11">{p.document.name}</a> <HashText hash={p.document.sha256} /></p>}
                <p className="text-ink-soft">Recorded by {p.recordedByName}.</p>
              </div>
            ) : <p className="text-sm text-ink-soft">Not recorded yet.</p>}
            {chair && (
              <details className="mt-2">
                <summary className="min-h-11 cursor-pointer py-2">{p.recorded ? "Record it again" : "Record this permission"}</summary>
                <StepForm id={`perm-${p.id}`} url={`/api/permissions/${p.id}/record`} fields={RECORD_FIELDS} submit="Record the permission" />
              </details>
            )}
          </li>
        ))}
      </ul>
      {chair && (
        <div className="mt-4 grid gap-4 sm:grid-cols-2">
          <details open={!data.plan}>
            <summary className="min-h-11 cursor-pointer py-2">Add a permission needed</summary>
            <StepForm id="need" url={`/api/commissions/${commissionId}/permissions`} submit="Add to the list"
              fields={[{ name: "name", label: "Permission (e.g. faculty, listed building consent)" }, { name: "authority", label: "From whom (optional)" }]} />
          </details>
          {!data.permissions.length && (
            <details>
              <summary className="min-h-11 cursor-pointer py-2">None is needed</summary>
              <StepForm id="none" url={`/api/commissions/${commissionId}/permissions`} submit="Record that none is needed" extra={{ noneRequired: true }}
                fields={[{ name: "reason", label: "Why, and on whose advice", kind: "textarea" }]} />
            </details>
          )}
        </div>
      )}
    </Card>
  );
}
