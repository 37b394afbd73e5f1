"use client";

import { useFormStatus } from "react-dom";
import type { ButtonProps } from "./button";
import { Button } from "./button";

/**
 * A submit Button that shows itself pending while its parent <form action> runs.
 * Client-only because it reads the form's status.
 */
export function SubmitButton({ pending, ...rest }: Omit<ButtonProps, "type">) {
  const status = useFormStatus();
  return <Button {...rest} type="submit" pending={pending || status.pending} />;
}
