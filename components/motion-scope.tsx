"use client";

import { LazyMotion, MotionConfig } from "framer-motion";
import type { ReactNode } from "react";

const loadFeatures = () => import("./motion-features").then((module) => module.default);

/**
 * Around the few places that move (a decision locking, an acknowledgement, swatches dragged on a
 * board). LazyMotion with `m` components fetches the animation code after the page has shown, and
 * only on pages that animate; reducedMotion="user" means no movement for people who ask their
 * system for less.
 */
export function MotionScope({ children }: { children: ReactNode }) {
  return (
    <LazyMotion features={loadFeatures} strict>
      <MotionConfig reducedMotion="user">{children}</MotionConfig>
    </LazyMotion>
  );
}
