import type { Metadata } from "next";
import Link from "next/link";
import { Card } from "@/components/ui/card";
import { buttonClass } from "@/components/ui/button";
import { StaffList } from "@/components/studio/StaffList";
import { SettingsForm } from "@/components/studio/SettingsForm";
import { SettingsView } from "@/components/studio/SettingsView";
import { ColdWorkingSafety } from "@/components/studio/ColdWorkingSafety";
import { saveStudioSettings } from "./actions";
import { studioForPage } from "./studio-for-page";

export const metadata: Metadata = { title: "Studio" };

export default async function StudioPage() {
  const { viewer, studio } = await studioForPage("/studio");
  const owner = studio.role === "owner";
  return (
    <div className="grid gap-5">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <p className="text-sm text-ink-soft">{studio.town || "Studio"}</p>
          <h1 className="text-3xl font-semibold" data-testid="studio-name">{studio.name}</h1>
        </div>
        <Link href="/studio/sketchpad" className={buttonClass("secondary")}>Open the sketchpad</Link>
      </div>
      <Card title="Staff">
        <StaffList staff={studio.staff} />
      </Card>
      <section aria-labelledby="settings-h" className="grid gap-4">
        <div>
          <h2 id="settings-h" className="text-2xl font-semibold">Cold-working settings</h2>
          <p className="text-ink-soft">
            {owner
              ? "The machines, abrasive sets and stock every cold-working plan starts from. Changes apply to plans made from now on."
              : "The machines, abrasive sets and stock every cold-working plan starts from. Only the studio's owner changes them."}
          </p>
        </div>
        <ColdWorkingSafety />
        {owner ? <SettingsForm initial={studio.settings} initialUnits={viewer.units} save={saveStudioSettings} /> : <SettingsView settings={studio.settings} />}
      </section>
    </div>
  );
}
