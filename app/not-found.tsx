import Link from "next/link";

export default function NotFound() {
  return (
    <div className="mx-auto max-w-md py-10">
      <h1 className="mb-3 text-3xl font-semibold">Not found</h1>
      <p className="mb-4 text-ink-soft">There is nothing here for you. If you were sent a link, check that you are signed in with the address that was invited.</p>
      <Link href="/commissions">Your commissions</Link>
    </div>
  );
}
