import type { Metadata } from "next";
import Link from "next/link";
import { Card } from "@/components/ui/Card";
import { SignUpForm } from "./SignUpForm";

export const metadata: Metadata = { title: "Create an account" };

export default function SignUpPage() {
  return (
    <Card className="mx-auto max-w-md">
      <h1 className="text-2xl font-bold">Create your Hubface account</h1>
      <p className="mt-1 text-sm text-basalt-600">
        Save comparisons, keep your vehicles and their measured clearances. Already have one?{" "}
        <Link className="font-medium text-ember-700 underline" href="/sign-in">
          Sign in
        </Link>
      </p>
      <SignUpForm />
    </Card>
  );
}
