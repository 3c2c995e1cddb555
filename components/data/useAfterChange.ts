"use client";

import { useCallback } from "react";
import { useRouter } from "next/navigation";
import { useSWRConfig } from "swr";

export interface AfterChange {
  /** SWR keys (API URLs) whose cached answers the change made stale. */
  revalidate?: string[];
  /** Open another page (a record just made). */
  goTo?: string;
  /** Re-render the server components of the page (default true); the editor keeps its own state and says false. */
  page?: boolean;
}

/**
 * THE way a client component refreshes after it changed something through
 * the API: revalidate the SWR keys that show the record, then re-render the
 * page's server components (router.refresh), or open the record's page.
 * Server actions do the same on the server (revalidatePath / redirect).
 */
export function useAfterChange(): (what?: AfterChange) => Promise<void> {
  const router = useRouter();
  const { mutate } = useSWRConfig();
  return useCallback(
    async ({ revalidate = [], goTo, page = true }: AfterChange = {}) => {
      await Promise.all(revalidate.map((key) => mutate(key)));
      if (goTo) router.push(goTo);
      else if (page) router.refresh();
    },
    [router, mutate],
  );
}
