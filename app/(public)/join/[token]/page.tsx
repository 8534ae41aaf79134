import type { Metadata } from "next";
import { Alert } from "@/components/ui/Alert";
import { Card } from "@/components/ui/Card";
import { shopQueries } from "@/lib/shop/queries";
import { userQueries } from "@/lib/accounts/queries";
import { isLinkToken } from "@/lib/platform/tokenFormat";
import { JoinForm } from "./JoinForm";

export const metadata: Metadata = { title: "Join a shop", robots: { index: false } };

export default async function JoinPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invite = isLinkToken(token) ? await shopQueries.findOpenInvite(token) : undefined;
  if (!invite) {
    return (
      <Card className="mx-auto max-w-lg">
        <h1 className="text-2xl font-bold">Invitation not usable</h1>
        <Alert tone="warning" className="mt-3">
          This invitation has expired, was withdrawn or was already used. Ask the shop owner for a new one.
        </Alert>
      </Card>
    );
  }
  const hasAccount = !!(await userQueries.findUserByEmail(invite.email));
  return (
    <Card className="mx-auto max-w-lg">
      <h1 className="text-2xl font-bold">Join {invite.shop_name}</h1>
      <p className="mt-1 text-basalt-600">
        You were invited as counter staff with <strong>{invite.email}</strong>.{" "}
        {hasAccount ? "This address already has a Hubface account: confirm with its password." : "Choose your name and a password."} As
        staff you can also do everything a member can: your garage and saved comparisons stay yours, and the shop does not see them.
      </p>
      <JoinForm token={token} email={invite.email} hasAccount={hasAccount} />
    </Card>
  );
}
