import Link from "next/link";
import { AuthCard } from "../_components/AuthCard";
import { ForgotPasswordForm } from "./ForgotPasswordForm";

export const metadata = { title: "Forgot password · Heatsplit" };

export default function ForgotPasswordPage() {
  return (
    <AuthCard
      title="Forgot your password?"
      intro="Enter the e-mail address of your account. We send a link to choose a new password; it works once, for one hour."
      footer={
        <Link href="/sign-in" className="text-copper-700 hover:underline">
          Back to sign in
        </Link>
      }
    >
      <ForgotPasswordForm />
    </AuthCard>
  );
}
