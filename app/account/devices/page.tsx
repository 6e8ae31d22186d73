import type { Metadata } from "next";
import { Card } from "@/components/ui/card";
import { buttonClass } from "@/components/ui/button";
import { listDevices } from "@/lib/dal/devices";
import { env } from "@/lib/env";
import { viewerOrSignIn } from "@/lib/session";
import { signOutOthersAction } from "./actions";

export const metadata: Metadata = { title: "Signed-in devices" };

const when = (iso: string) => new Date(iso).toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" }) + " UTC";

export default async function DevicesPage({ searchParams }: { searchParams: Promise<{ ended?: string }> }) {
  const viewer = await viewerOrSignIn("/account/devices");
  const devices = await listDevices(viewer);
  const { ended } = await searchParams;
  const others = devices.filter((d) => !d.thisDevice).length;
  return (
    <div className="mx-auto grid max-w-2xl gap-5">
      <h1 className="text-3xl font-semibold">Signed-in devices</h1>
      <p className="text-ink-soft">
        Each sign-in lasts at most {env.sessionAbsoluteSeconds / 3600} hours, and ends after {env.sessionIdleSeconds / 60} minutes without use.
      </p>
      {ended !== undefined && <p role="status" className="rounded-md border border-line bg-card px-3 py-2">Signed out on {Number(ended) || 0} other {Number(ended) === 1 ? "device" : "devices"}.</p>}
      <Card>
        <ul className="divide-y divide-line" data-testid="device-list">
          {devices.map((d, i) => (
            <li key={i} className="py-3" data-testid="device">
              <p className="font-medium">{d.browser}{d.thisDevice && <span className="ml-2 text-sm text-ink-soft">(this device)</span>}</p>
              <p className="text-sm text-ink-soft">Signed in {when(d.createdAt)} · last seen {when(d.lastSeenAt)}</p>
            </li>
          ))}
        </ul>
      </Card>
      <form action={signOutOthersAction}>
        <button type="submit" disabled={others === 0} className={buttonClass("secondary")}>Sign out everywhere else</button>
      </form>
    </div>
  );
}
