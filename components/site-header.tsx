import Link from "next/link";
import { getViewer } from "@/lib/session";
import { signOutAction } from "@/app/sign-in/actions";

export async function SiteHeader() {
  const viewer = await getViewer();
  return (
    <header className="border-b border-line bg-card/70">
      <div className="mx-auto flex max-w-5xl items-center gap-x-5 gap-y-2 px-4 py-2 sm:px-6">
        <Link href={viewer ? "/commissions" : "/"} className="font-serif text-2xl font-semibold text-ink no-underline">
          Placet
        </Link>
        {viewer ? (
          <nav className="flex flex-1 flex-wrap items-center justify-end gap-x-4 gap-y-1 text-sm" aria-label="Main">
            <Link href="/commissions" className="py-2 text-ink-soft hover:text-ink">Commissions</Link>
            {viewer.studios.length > 0 && <Link href="/studio" className="py-2 text-ink-soft hover:text-ink">Studio</Link>}
            <Link href="/verify" className="hidden py-2 text-ink-soft hover:text-ink sm:inline">Verify a record</Link>
            <Link href="/account/devices" className="hidden py-2 text-ink-soft hover:text-ink sm:inline" data-testid="signed-in-as" title="Signed-in devices">{viewer.name}</Link>
            <form action={signOutAction}>
              <button className="min-h-11 rounded-md px-3 text-ink-soft underline-offset-2 hover:underline">Sign out</button>
            </form>
          </nav>
        ) : (
          <nav className="flex flex-1 justify-end text-sm" aria-label="Main">
            <Link href="/verify" className="px-3 py-2 text-ink-soft">Verify a record</Link>
            <Link href="/sign-in" className="rounded-md bg-action px-4 py-2 font-medium text-action-ink no-underline">Sign in</Link>
          </nav>
        )}
      </div>
    </header>
  );
}
