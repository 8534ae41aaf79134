import type { Metadata } from "next";
import Link from "next/link";
import { buttonClass } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";

export const metadata: Metadata = { title: "Not allowed" };

export default function ForbiddenPage() {
  return (
    <Card className="mx-auto max-w-xl text-center">
      <h1 className="text-2xl font-bold">Your account can&apos;t open that page</h1>
      <p className="mt-2 text-basalt-600">It belongs to another role (for example shop staff or admins). Ask an admin if you need it.</p>
      <Link href="/account" className={buttonClass("secondary", "mt-5")}>
        Back to your account
      </Link>
    </Card>
  );
}
