import { Card } from "@/components/ui/card";
import { ReleaseButton } from "./ReleaseButton";

export interface ReleaseCardProps {
  commissionId: number;
  status: { ready: boolean; missing: string[]; releasedAt: string | null };
  mayRelease: boolean;
}

const when = (iso: string) => `${iso.slice(0, 16).replace("T", " ")} UTC`;

/** Where the commission stands on release to fabrication: what is still missing, or when it was released. */
export function ReleaseCard({ commissionId, status, mayRelease }: ReleaseCardProps) {
  return (
    <Card title="Release to fabrication">
      {status.releasedAt ? (
        <p>Released to fabrication on {when(status.releasedAt)}. The workshop works from the approved revision as it was then.</p>
      ) : status.ready ? (
        <div className="grid gap-3">
          <p>Everything is in place: the studio owner may release the approved revision to the workshop.</p>
          {mayRelease && <ReleaseButton commissionId={commissionId} />}
        </div>
      ) : (
        <div className="grid gap-2">
          <p>Before the workshop can begin, the commission still needs:</p>
          <ul className="list-disc space-y-1 pl-5" aria-label="Still needed before release">
            {status.missing.map((m) => <li key={m}>{m}</li>)}
          </ul>
        </div>
      )}
    </Card>
  );
}
