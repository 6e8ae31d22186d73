import { CopyHash } from "@/components/copy-hash";
import { attachmentChanges } from "./diff";
import type { CompareSide } from "./types";

type File = CompareSide["attachments"][number];

function FileList({ title, files, tone, testId }: { title: string; files: File[]; tone: string; testId: string }) {
  return (
    <div data-testid={testId}>
      <h4 className="mb-1 font-semibold">{title}</h4>
      {files.length === 0 ? (
        <p className="text-sm text-ink-soft">None.</p>
      ) : (
        <ul className="grid gap-1 text-sm">
          {files.map((f) => (
            <li key={`${f.id}`} className={`flex flex-wrap items-center gap-x-2 border-l-4 pl-2 ${tone}`}>
              <a href={f.url} className="min-w-0 break-all py-2">{f.name}</a>
              <span className="text-ink-soft">{f.kind.toUpperCase()}</span>
              <CopyHash hash={f.sha256} label="SHA-256 of the file" />
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}

/** Drawings and renders added and removed, matched by their SHA-256 (a renamed file is the same file). */
export function AttachmentChanges({ older, newer }: { older: CompareSide; newer: CompareSide }) {
  const { added, removed, kept } = attachmentChanges(older.attachments, newer.attachments);
  return (
    <section aria-labelledby="files-h" className="grid gap-3 rounded-lg border border-line bg-card p-4">
      <h3 id="files-h" className="font-serif text-xl font-semibold">Drawings and renders</h3>
      <FileList title={`Added in Revision ${newer.number}`} files={added} tone="border-ok" testId="files-added" />
      <FileList title={`Removed since Revision ${older.number}`} files={removed} tone="border-danger" testId="files-removed" />
      <p className="text-sm text-ink-soft">
        {kept.length === 0 ? "No file is in both revisions." : `${kept.length === 1 ? "One file is" : `${kept.length} files are`} the same in both (same SHA-256).`}
      </p>
    </section>
  );
}
