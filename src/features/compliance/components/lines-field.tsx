import { useState } from "react";
import { TextAreaField } from "@/components/ui/field";

type Props = {
  label: string;
  value: readonly string[];
  onChange: (lines: string[]) => void;
  onBlur?: () => void;
  error?: string;
  hint?: string;
  name?: string;
};

const linesOf = (text: string) =>
  text
    .split("\n")
    .map((line) => line.trim())
    .filter(Boolean);

/**
 * A list of names or statements, one per line. The text is kept as typed (a new empty line
 * stays while typing); the list given to the form has the filled lines only.
 */
export function LinesField({ label, value, onChange, onBlur, error, hint, name }: Props) {
  const [text, setText] = useState(value.join("\n"));
  const [seen, setSeen] = useState(value);
  if (seen !== value && linesOf(text).join("\n") !== value.join("\n")) {
    setSeen(value);
    setText(value.join("\n"));
  }
  return (
    <TextAreaField
      label={label}
      name={name}
      value={text}
      error={error}
      hint={hint}
      onBlur={onBlur}
      onChange={(event) => {
        setText(event.target.value);
        const lines = linesOf(event.target.value);
        setSeen(lines);
        onChange(lines);
      }}
    />
  );
}
