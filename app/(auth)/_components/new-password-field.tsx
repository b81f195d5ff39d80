import { Field } from "@/components/ui/field";

/** The password a person chooses (sign-up, a staff invitation): the same label, hint and autofill. */
export function NewPasswordField(props: Omit<React.ComponentProps<typeof Field>, "label" | "type">) {
  return (
    <Field
      label="Password"
      type="password"
      autoComplete="new-password"
      hint="At least 10 characters."
      {...props}
    />
  );
}
