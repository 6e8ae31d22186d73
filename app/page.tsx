import Link from "next/link";
import { redirect } from "next/navigation";
import { getViewer } from "@/lib/session";
import { buttonClass } from "@/components/ui/button";

export default async function Home() {
  if (await getViewer()) redirect("/commissions");
  return (
    <div className="mx-auto max-w-2xl py-8">
      <p className="mb-2 font-serif text-lg italic text-record">placet — it pleases</p>
      <h1 className="mb-4 text-4xl font-semibold sm:text-5xl">Decide a commission together, on the record.</h1>
      <p className="mb-4 text-lg text-ink-soft">
        Placet is where a studio shows each numbered revision of a design — drawings, renders and a model whose
        weight, capacity and stability are worked out — and where the committee that commissioned it reads,
        comments on the exact spot, votes from their phones and records its decision under its own rules.
      </p>
      <p className="mb-8 text-lg text-ink-soft">
        Every step lands in a decision trail that anyone can check has not been altered.
      </p>
      <div className="flex flex-wrap gap-3">
        <Link href="/sign-in" className={buttonClass("primary")}>Sign in</Link>
        <Link href="/verify" className={buttonClass("secondary")}>Check a downloaded record</Link>
      </div>
    </div>
  );
}
