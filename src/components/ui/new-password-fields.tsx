import { MIN_PASSWORD_LENGTH } from '../../lib/form-errors';
import { TextField } from './text-field';

/** A new password typed twice: the pair of fields every password-setting form uses. */
export function NewPasswordFields({
  name,
  label = 'New password',
  password,
  repeat,
  onPasswordChange,
  onRepeatChange,
  errors,
}: {
  /** Field name of the password, as the server's `fields` name it. */
  name: string;
  label?: string;
  password: string;
  repeat: string;
  onPasswordChange: (value: string) => void;
  onRepeatChange: (value: string) => void;
  errors: Partial<Record<string, string>>;
}) {
  return (
    <>
      <TextField
        label={label}
        hint={`At least ${MIN_PASSWORD_LENGTH} characters.`}
        name={name}
        type="password"
        autoComplete="new-password"
        value={password}
        onChange={(event) => onPasswordChange(event.target.value)}
        error={errors[name]}
      />
      <TextField
        label="Repeat password"
        name="repeat"
        type="password"
        autoComplete="new-password"
        value={repeat}
        onChange={(event) => onRepeatChange(event.target.value)}
        error={errors.repeat}
      />
    </>
  );
}
