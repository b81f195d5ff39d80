import { useId } from "react";

interface FieldProps extends React.InputHTMLAttributes<HTMLInputElement> {
  label: string;
  error?: string | null;
  hint?: string;
}

interface TextAreaFieldProps extends React.TextareaHTMLAttributes<HTMLTextAreaElement> {
  label: string;
  error?: string | null;
  hint?: string;
}

/** The label, hint and error around one control, tied to it for assistive technology. */
function FieldFrame({
  id,
  label,
  error,
  hint,
  control,
}: {
  id?: string;
  label: string;
  error?: string | null;
  hint?: string;
  control: (props: { id: string; "aria-invalid"?: true; "aria-describedby"?: string }) => React.ReactNode;
}) {
  const autoId = useId();
  const inputId = id ?? autoId;
  const describedBy = [hint ? `${inputId}-hint` : null, error ? `${inputId}-error` : null]
    .filter(Boolean)
    .join(" ");
  return (
    <div>
      <label htmlFor={inputId} className="field-label">
        {label}
      </label>
      {control({
        id: inputId,
        "aria-invalid": error ? true : undefined,
        "aria-describedby": describedBy || undefined,
      })}
      {hint && (
        <p id={`${inputId}-hint`} className="field-hint">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${inputId}-error`} className="field-error" role="alert">
          {error}
        </p>
      )}
    </div>
  );
}

/** A labelled input whose hint and error are tied to it for assistive technology. */
export function Field({ label, error, hint, id, ...input }: FieldProps) {
  return (
    <FieldFrame
      id={id}
      label={label}
      error={error}
      hint={hint}
      control={(tie) => <input {...tie} className="field-input" {...input} />}
    />
  );
}

/** A labelled text area, as `Field` is for inputs. */
export function TextAreaField({ label, error, hint, id, className, ...textarea }: TextAreaFieldProps) {
  return (
    <FieldFrame
      id={id}
      label={label}
      error={error}
      hint={hint}
      control={(tie) => (
        <textarea {...tie} className={className ? `field-input ${className}` : "field-input"} {...textarea} />
      )}
    />
  );
}
