import Link from "next/link";
import { Card } from "@/components/ui/Card";
import { buttonClass } from "@/components/ui/Button";

export default function NotFound() {
  return (
    <Card className="mx-auto max-w-xl text-center">
      <h1 className="text-2xl font-bold">Nothing here</h1>
      <p className="mt-2 text-basalt-600">This page does not exist, or the link has been revoked.</p>
      <Link href="/" className={buttonClass("secondary", "mt-5")}>
        Go to the start page
      </Link>
    </Card>
  );
}
