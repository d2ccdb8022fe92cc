import { Button, type ButtonProps } from './button';

export type SubmitButtonProps = ButtonProps & {
  /** What the button says while the request runs (it is disabled meanwhile). */
  pendingLabel: string;
  pending?: boolean;
};

/** A form's submit button: its label says when the request is on its way, and it cannot be pressed twice. */
export function SubmitButton({ label, pendingLabel, pending = false, disabled, ...rest }: SubmitButtonProps) {
  return <Button label={pending ? pendingLabel : label} disabled={pending || disabled} {...rest} />;
}
