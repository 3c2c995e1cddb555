"use client";

import dynamic from "next/dynamic";

/** The comparison chart loads after the table: the page's figures never wait for nivo. */
export const ComparisonChartLazy = dynamic(() => import("./ComparisonChart"), {
  ssr: false,
  loading: () => <div className="h-[300px] animate-pulse rounded-md bg-paper-sunk" />,
});
