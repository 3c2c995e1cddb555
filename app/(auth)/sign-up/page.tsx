import Link from "next/link";
import { AuthCard } from "../_components/AuthCard";
import { SignUpForm } from "./SignUpForm";

export const metadata = { title: "Create an account · Heatsplit" };

export default function SignUpPage() {
  return (
    <AuthCard
      title="Create an account"
      intro="You become the admin of a new workspace. To join an existing one, use the invitation link a colleague sent you."
      footer={
        <>
          Already have an account?{" "}
          <Link href="/sign-in" className="text-copper-700 hover:underline">
            Sign in
          </Link>
        </>
      }
    >
      <SignUpForm />
    </AuthCard>
  );
}
