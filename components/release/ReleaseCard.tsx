import Link from "next/link";
import { Card } from "@/components/ui/card";
import { ReleaseButton } from "./ReleaseButton";

export interface ReleaseCardProps {
  commissionId: number;
  status: { ready: boolean; missing: string[]; releasedAt: string | null };
  mayRelease: boolean;
  /** Show a link to the release page (on the overview). */
  linkToDetails?: boolean;
}

const when = (iso: string) => `${iso.slice(0, 16).replace("T", " ")} UTC`;

/** Where the commission stands on release to fabrication: what is still missing, or when it was released. */
export function ReleaseCard({ commissionId, status, mayRelease, linkToDetails = false }: ReleaseCardProps) {
  const details = linkToDetails ? <Link href={`/commissions/${commissionId}/release`} className="min-h-11 py-2">Permissions and conditions</Link> : undefined;
  return (
    <Card title="Release to fabrication" action={details}>
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
