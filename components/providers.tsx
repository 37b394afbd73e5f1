"use client";

import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { useState, type ReactNode } from "react";

export function Providers({ children }: { children: ReactNode }) {
  const [client] = useState(
    () => new QueryClient({ defaultOptions: { queries: { staleTime: 30_000, refetchOnWindowFocus: true, retry: 1 } } }),
  );
  // Animation is set up where it is used (MotionScope), so pages that never move carry none of it.
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}
