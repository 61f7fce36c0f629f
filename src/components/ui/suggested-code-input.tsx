import { useEffect, useRef, type ComponentPropsWithRef } from 'react';
import { TextInput } from './text-input';

interface Props extends Omit<ComponentPropsWithRef<'input'>, 'id'> {
  error?: string;
  /** The server's next code in the lab's own pattern; undefined while it loads or if it failed. */
  suggestion: string | undefined;
  /** The user has typed in the field: a late suggestion must not overwrite them. */
  edited: boolean;
  onSuggestion: (code: string) => void;
}

/** The Code field of a new record, filled with the suggested next code and still editable. */
export function SuggestedCodeInput({ suggestion, edited, onSuggestion, ...input }: Props) {
  // Each suggestion is put in once; without this a re-render would undo a deliberate clearing.
  const applied = useRef<string | undefined>(undefined);
  useEffect(() => {
    if (!suggestion || edited || applied.current === suggestion) return;
    applied.current = suggestion;
    onSuggestion(suggestion);
  }, [suggestion, edited, onSuggestion]);

  return (
    <TextInput
      label="Code"
      autoComplete="off"
      hint={suggestion ? 'The next in the lab’s own sequence; change it if needed.' : undefined}
      {...input}
    />
  );
}
