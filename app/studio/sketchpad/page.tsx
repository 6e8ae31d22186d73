import type { Metadata } from "next";
import Link from "next/link";
import { FontEditor } from "@/components/font";
import { studioForPage } from "../studio-for-page";

export const metadata: Metadata = { title: "Sketchpad" };

export default async function SketchpadPage() {
  const { viewer, studio } = await studioForPage("/studio/sketchpad");
  return (
    <div className="grid gap-4">
      <div>
        <Link href="/studio" className="inline-flex min-h-11 items-center text-sm">{studio.name}</Link>
        <h1 className="text-3xl font-semibold">Sketchpad</h1>
        <p className="text-ink-soft">
          Try a form and see its figures and cold-working plan with the studio&apos;s own machines and abrasives.
          Nothing here is saved; to propose a form, draft a revision on a commission.
        </p>
      </div>
      <FontEditor studioSettings={studio.settings} initialUnits={viewer.units} />
    </div>
  );
}
