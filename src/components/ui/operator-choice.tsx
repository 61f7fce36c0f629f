import type { UseFormRegisterReturn } from 'react-hook-form';
import { TextInput } from './text-input';

interface OperatorChoiceProps {
  /** What the signed-in person did, e.g. "I ran it". */
  selfLabel: string;
  selfName: string;
  bySelf: boolean;
  onChooseSelf: () => void;
  onChooseOther: () => void;
  staffName: UseFormRegisterReturn;
  error?: string;
}

/** The operator of a record: the signed-in user, or a staff name typed in. */
export function OperatorChoice({
  selfLabel,
  selfName,
  bySelf,
  onChooseSelf,
  onChooseOther,
  staffName,
  error,
}: OperatorChoiceProps) {
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="mb-2 font-medium">Operator</legend>
      <label className="flex min-h-touch items-center gap-3">
        <input type="radio" className="size-5 accent-accent" checked={bySelf} onChange={onChooseSelf} />
        {selfLabel} ({selfName})
      </label>
      <label className="flex min-h-touch items-center gap-3">
        <input type="radio" className="size-5 accent-accent" checked={!bySelf} onChange={onChooseOther} />
        Someone else
      </label>
      {!bySelf && <TextInput label="Staff name" error={error} {...staffName} />}
    </fieldset>
  );
}
