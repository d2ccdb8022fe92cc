export type PrintButtonProps = { testID?: string };

/** Native: printing goes through the web app (see print-button.web.tsx); nothing to show here. */
export function PrintButton(_props: PrintButtonProps) {
  return null;
}
