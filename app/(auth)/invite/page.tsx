import { AuthCard } from "../_components/AuthCard";
import { AcceptInviteForm } from "./AcceptInviteForm";

export const metadata = { title: "Invitation · Heatsplit" };

export default function InvitePage() {
  return (
    <AuthCard title="You are invited" intro="A colleague invited you to their Heatsplit workspace.">
      <noscript>
        <p className="text-sm text-alarm-700">This page needs JavaScript to read the invitation from your link.</p>
      </noscript>
      <AcceptInviteForm />
    </AuthCard>
  );
}
