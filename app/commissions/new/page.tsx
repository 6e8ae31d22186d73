import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { viewerOrSignIn } from "@/lib/session";
import { Card } from "@/components/ui/card";
import { NewCommissionForm } from "./form";

export const metadata: Metadata = { title: "New commission" };

export default async function NewCommissionPage() {
  const viewer = await viewerOrSignIn("/commissions/new");
  if (!viewer.studios.length) notFound();
  return (
    <div className="max-w-xl">
      <h1 className="mb-4 text-3xl font-semibold">New commission</h1>
      <Card><NewCommissionForm /></Card>
    </div>
  );
}
