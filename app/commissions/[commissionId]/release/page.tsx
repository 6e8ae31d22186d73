import type { Metadata } from "next";
import { commissionForPage, orNotFound } from "@/lib/page-data";
import { getReleaseStatus } from "@/lib/dal/release";
import { getPermissions } from "@/lib/dal/permissions";
import { getConditions } from "@/lib/dal/condition-answers";
import { ReleaseCard } from "@/components/release/ReleaseCard";
import { PermissionsCard } from "@/components/release/PermissionsCard";
import { ConditionsCard } from "@/components/release/ConditionsCard";

export const metadata: Metadata = { title: "Release to fabrication" };

export default async function ReleasePage({ params }: { params: Promise<{ commissionId: string }> }) {
  const { commissionId } = await params;
  const { viewer, commission: c } = await commissionForPage(commissionId, `/commissions/${commissionId}/release`);
  const [status, permissions, conditions] = await orNotFound(Promise.all([getReleaseStatus(viewer, c.id), getPermissions(viewer, c.id), getConditions(viewer, c.id)]));
  const released = status.releasedAt !== null;
  return (
    <div className="grid gap-4">
      <ReleaseCard commissionId={c.id} status={status} mayRelease={Boolean(c.you.can["release.release"])} />
      <PermissionsCard commissionId={c.id} data={permissions} released={released} />
      <ConditionsCard commissionId={c.id} data={conditions} released={released} />
    </div>
  );
}
