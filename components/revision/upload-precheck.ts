import { countCheck, MAX_FILE_BYTES } from "@/lib/uploads/limits";
import { checkName, extensionOf } from "@/lib/uploads/names";

const TAKEN = new Set(["png", "jpg", "jpeg", "webp", "pdf"]);
export const ACCEPT_ATTRIBUTE = ".png,.jpg,.jpeg,.webp,.pdf,image/png,image/jpeg,image/webp,application/pdf";

/**
 * Early checks in the browser, so people hear at once about a file that cannot go; the server checks
 * again, by content, and decides. Returns the display name and a refusal message, or null if it may go.
 */
export function precheck(file: { name: string; size: number }, slotsTaken: number): { safeName: string; problem: string | null } {
  const name = checkName(file.name);
  const shown = `“${name.safeName}”`;
  if (!name.ok) return { safeName: name.safeName, problem: name.message };
  const ext = extensionOf(name.safeName);
  if (!ext || !TAKEN.has(ext)) {
    return { safeName: name.safeName, problem: `${shown} is not a kind of file a revision takes. Attach PNG, JPEG or WebP images, or PDFs.` };
  }
  if (file.size === 0) return { safeName: name.safeName, problem: `${shown} is empty (0 bytes). Choose the file again.` };
  if (file.size > MAX_FILE_BYTES) {
    const mb = (file.size / (1024 * 1024)).toFixed(1);
    return { safeName: name.safeName, problem: `${shown} is ${mb} MB, over the limit of 25 MB per file. Make it smaller (for a photo, export it at a lower size) and try again.` };
  }
  const room = countCheck(slotsTaken, 1);
  if (!room.ok) return { safeName: name.safeName, problem: `${shown} cannot be added: ${room.message}` };
  return { safeName: name.safeName, problem: null };
}
