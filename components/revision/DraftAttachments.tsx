"use client";
import { useQuery, useQueryClient } from "@tanstack/react-query";
import type { AttachmentDto } from "@/lib/dal/revisions-read";
import { AttachmentUploader } from "./AttachmentUploader";
import { Gallery } from "./Gallery";

async function fetchAttachments(revisionId: number): Promise<AttachmentDto[]> {
  const res = await fetch(`/api/revisions/${revisionId}/attachments`, { headers: { accept: "application/json" } });
  if (!res.ok) throw new Error("Could not load the revision's files.");
  return (await res.json()).attachments;
}

/** A draft's files for the studio: the uploader and the editable gallery, kept fresh together. */
export function DraftAttachments({ revisionId, initial }: { revisionId: number; initial: AttachmentDto[] }) {
  const client = useQueryClient();
  const { data = initial } = useQuery({ queryKey: ["attachments", revisionId], queryFn: () => fetchAttachments(revisionId), initialData: initial });
  const refresh = () => {
    void client.invalidateQueries({ queryKey: ["attachments", revisionId] });
    void client.invalidateQueries({ queryKey: ["revision", revisionId] });
  };
  return (
    <div className="grid gap-4" data-testid="draft-attachments">
      <Gallery attachments={data} editable onChanged={refresh} />
      <AttachmentUploader revisionId={revisionId} existingCount={data.length} onUploaded={refresh} />
    </div>
  );
}
