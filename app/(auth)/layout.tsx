import type { ReactNode } from "react";
import { PublicFrame } from "@/components/shell/PublicFrame";

// Signed-out pages: sign-in, sign-up, password reset, invitations.
export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <PublicFrame>
      <div className="mx-auto flex w-full max-w-md flex-col px-4 py-12 sm:px-6">{children}</div>
    </PublicFrame>
  );
}
