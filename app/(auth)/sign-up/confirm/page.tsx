import { AuthCard } from "../../_components/AuthCard";
import { ConfirmSignUpForm } from "./ConfirmSignUpForm";

export const metadata = { title: "Finish signing up · Heatsplit" };

export default function ConfirmSignUpPage() {
  return (
    <AuthCard title="Finish signing up" intro="One step left: create your account and your workspace, of which you become the admin.">
      <noscript>
        <p className="text-sm text-alarm-700">This page needs JavaScript to read the link from your e-mail.</p>
      </noscript>
      <ConfirmSignUpForm />
    </AuthCard>
  );
}
