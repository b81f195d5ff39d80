/**
 * A form's submit button bound to a mutation's `pending`: disabled and saying what it is doing
 * while the call runs, usable again as soon as it ends (a failed call included).
 */
export function SubmitButton({
  pending,
  busyLabel,
  className = "btn-primary",
  disabled,
  children,
  ...button
}: Omit<React.ButtonHTMLAttributes<HTMLButtonElement>, "type"> & {
  pending: boolean;
  busyLabel: React.ReactNode;
}) {
  return (
    <button
      type="submit"
      className={className}
      disabled={pending || disabled}
      aria-busy={pending || undefined}
      {...button}
    >
      {pending ? busyLabel : children}
    </button>
  );
}
