import type { ReactNode } from "react";
import { cx } from "./cx";
import { ToneIcon } from "./tone-icon";

export type FieldError = string | readonly string[] | null | undefined;

/** The ids Field gives its hint and error, so a control can point at them. */
export function fieldIds(id: string): { hintId: string; errorId: string } {
  return { hintId: `${id}-hint`, errorId: `${id}-error` };
}

function errorList(error: FieldError): string[] {
  if (!error) return [];
  return (typeof error === "string" ? [error] : [...error]).filter((e) => e.trim() !== "");
}

/**
 * Props to spread on the control inside a Field: id, aria-describedby (hint, then error)
 * and `invalid` (which Input/Textarea/Select turn into aria-invalid and the error border).
 * Field renders no wrapper around children, so this keeps the wiring explicit.
 */
export function describeField(
  id: string,
  { hint, error }: { hint?: ReactNode; error?: FieldError },
): { id: string; "aria-describedby"?: string; invalid: boolean } {
  const { hintId, errorId } = fieldIds(id);
  const hasError = errorList(error).length > 0;
  const describedBy = [hint ? hintId : null, hasError ? errorId : null].filter(Boolean).join(" ");
  return { id, ...(describedBy ? { "aria-describedby": describedBy } : {}), invalid: hasError };
}

export type FieldProps = (
  | { /** The control's id; the label points at it. */ htmlFor: string; id?: never }
  | { /** Same as htmlFor. */ id: string; htmlFor?: never }
) & {
  label: ReactNode;
  hint?: ReactNode;
  error?: FieldError;
  /** Says "(optional)" after the label; required is the default expectation. */
  optional?: boolean;
  className?: string;
  children: ReactNode;
};

// Order: label, hint, error, control. The error sits above the control so it stays in view
// when a phone keyboard covers the lower half of the screen.
// No role="alert": errors are announced through aria-describedby when the control is focused.
export function Field({ htmlFor, id: idProp, label, hint, error, optional = false, className, children }: FieldProps) {
  const id = htmlFor ?? idProp ?? "";
  const { hintId, errorId } = fieldIds(id);
  const errors = errorList(error);
  return (
    <div className={cx("flex flex-col gap-1.5", className)}>
      <label htmlFor={id} className="text-base font-medium text-ink">
        {label}
        {optional && <span className="font-normal text-stone-600"> (optional)</span>}
      </label>
      {hint && (
        <p id={hintId} className="text-sm text-stone-600">
          {hint}
        </p>
      )}
      {errors.length > 0 && (
        <div id={errorId} className="flex items-start gap-1.5 text-sm font-medium text-problem-ink">
          <ToneIcon tone="problem" className="mt-0.5 text-problem" />
          {errors.length === 1 ? (
            <p>{errors[0]}</p>
          ) : (
            <ul className="flex flex-col gap-0.5">
              {errors.map((e, i) => (
                <li key={i}>{e}</li>
              ))}
            </ul>
          )}
        </div>
      )}
      {children}
    </div>
  );
}
