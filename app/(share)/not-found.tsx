import Link from "next/link";
import { buttonClass } from "@/components/ui/Button";
import { Card } from "@/components/ui/Card";

export default function ShareNotFound() {
  return (
    <Card className="mx-auto max-w-xl text-center">
      <h1 className="text-2xl font-bold">This shared comparison is not available</h1>
      <p className="mt-2 text-basalt-600">
        The link is mistyped, or its owner revoked it or replaced it with a new one. Ask them for the current link.
      </p>
      <Link href="/workspace" className={buttonClass("secondary", "mt-5")}>
        Build your own comparison
      </Link>
    </Card>
  );
}
