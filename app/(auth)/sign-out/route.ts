import { publicRoute } from "@/app/_lib/access";
import { signOut } from "@/services/accounts/sign-in";

// Target of the shell's plain <form method="post" action="/sign-out"> (same
// flow as POST /api/v1/auth/sign-out). The Origin check stops other sites
// from signing people out.
export const POST = publicRoute({}, async () => {
  await signOut();
  return new Response(null, { status: 303, headers: { location: "/sign-in" } });
});
