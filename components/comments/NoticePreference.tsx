"use client";
import { useState } from "react";
import { useMutation } from "@tanstack/react-query";
import { patchNotices, type CommentApiError } from "./api";

type Choice = "immediate" | "digest";
const CHOICES: { value: Choice; label: string; hint: string }[] = [
  { value: "immediate", label: "A mail each time", hint: "when someone replies to you or mentions you" },
  { value: "digest", label: "One daily digest", hint: "all of the day's replies and mentions in one mail, late afternoon" },
];

/** The signed-in person's choice of comment notices, saved as soon as it changes. */
export function NoticePreference({ initial }: { initial: Choice }) {
  const [value, setValue] = useState<Choice>(initial);
  const [saved, setSaved] = useState(false);
  const save = useMutation<{ notices: Choice }, CommentApiError, { next: Choice; prev: Choice }>({
    mutationFn: ({ next }) => patchNotices(next),
    onMutate: () => setSaved(false),
    onSuccess: (r) => { setValue(r.notices); setSaved(true); },
    onError: (_e, { prev }) => setValue(prev),
  });
  const choose = (next: Choice) => { if (next !== value) { save.mutate({ next, prev: value }); setValue(next); } };
  return (
    <fieldset className="rounded-lg border border-line bg-card p-4" data-testid="notice-preference">
      <legend className="px-1 font-serif text-lg font-semibold">Notices</legend>
      <p className="mb-2 text-sm text-ink-soft">How Placet tells you about replies to your comments and mentions of you.</p>
      {CHOICES.map((c) => (
        <label key={c.value} className="flex min-h-11 cursor-pointer items-start gap-3 rounded-md px-2 py-2 hover:bg-paper-deep">
          <input type="radio" name="notices" value={c.value} checked={value === c.value} onChange={() => choose(c.value)}
            disabled={save.isPending} className="mt-1 h-5 w-5 accent-action" />
          <span><span className="font-medium">{c.label}</span> <span className="text-sm text-ink-soft">— {c.hint}</span></span>
        </label>
      ))}
      <p role="status" className="min-h-5 text-sm text-ok">{saved && !save.isPending ? "Saved." : ""}</p>
      {save.error && <p role="alert" className="text-sm text-danger">{save.error.message}</p>}
    </fieldset>
  );
}
