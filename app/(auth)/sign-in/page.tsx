import Link from "next/link";
import { redirect } from "next/navigation";
import { getSignedInContext } from "@/app/_lib/access";
import { safeNextPath } from "@/lib/paths";
import { Button } from "@/components/ui/Button";
import { AuthCard } from "../_components/AuthCard";
import { SignInForm } from "./SignInForm";

export const metadata = { title: "Sign in · Heatsplit" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ next?: string | string[] }> }) {
  const raw = (await searchParams).next;
  const next = safeNextPath(typeof raw === "string" ? raw : undefined);
  const ctx = await getSignedInContext();
  if (ctx?.member) redirect(next);
  if (ctx) {
    // Signed in, but removed from every workspace.
    return (
      <AuthCard title="No workspace" intro={`You are signed in as ${ctx.user.email}, but you are not a member of any workspace.`}>
        <p className="text-sm text-ink-soft">Ask a workspace admin to invite you again, or sign out and create a new account.</p>
        <form method="post" action="/sign-out" className="mt-4">
          <Button type="submit" variant="secondary">
            Sign out
          </Button>
        </form>
      </AuthCard>
    );
  }
  return (
    <AuthCard
      title="Sign in"
      intro="Welcome back to the gate-drive budget."
      footer={
        <>
          New to Heatsplit?{" "}
          <Link href="/sign-up" className="text-copper-700 hover:underline">
            Create an account and a workspace
          </Link>
        </>
      }
    >
      <SignInForm next={next} />
    </AuthCard>
  );
}
