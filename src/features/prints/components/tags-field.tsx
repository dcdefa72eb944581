import { useState } from 'react';
import { TextField } from '@/components/ui/field';

/** Tags typed as "pond, dusk" and kept as a list. */
export function TagsField({
  value,
  onChange,
  error,
}: {
  value: string[] | undefined;
  onChange: (tags: string[]) => void;
  error?: string;
}) {
  const [text, setText] = useState((value ?? []).join(', '));
  return (
    <TextField
      label="Tags"
      value={text}
      hint="Separate tags with commas."
      error={error}
      onChange={(event) => setText(event.target.value)}
      onBlur={() =>
        onChange(
          text
            .split(',')
            .map((tag) => tag.trim())
            .filter(Boolean),
        )
      }
    />
  );
}
