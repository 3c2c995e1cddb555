import { AuthCard } from "../_components/AuthCard";
import { ResetPasswordForm } from "./ResetPasswordForm";

export const metadata = { title: "Choose a new password · Heatsplit" };

export default function ResetPasswordPage() {
  return (
    <AuthCard title="Choose a new password" intro="After the change, every device signed in to your account is signed out.">
      <noscript>
        <p className="text-sm text-alarm-700">This page needs JavaScript to read the link from your e-mail.</p>
      </noscript>
      <ResetPasswordForm />
    </AuthCard>
  );
}
