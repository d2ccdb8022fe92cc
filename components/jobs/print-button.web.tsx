import { useEffect } from 'react';
import { StyleSheet, View } from 'react-native';
import { Colors } from '@/lib/theme';
import { Button } from '../ui/button';

export type PrintButtonProps = { testID?: string };

const STYLE_ID = 'specbench-print-styles';

/**
 * Print rules for the report, added to the page while it is shown. The app scrolls
 * inside views of the window's height, so for paper every box is let grow to its
 * content; the app header and this button stay off the paper; dark mode prints light.
 */
const PRINT_CSS = `
@media print {
  @page { size: A4; margin: 14mm 12mm; }
  html, body, #root { height: auto !important; min-height: 0 !important; overflow: visible !important; background: ${Colors.light.surface} !important; }
  #root * { overflow: visible !important; }
  #root div { max-height: none !important; }
  [data-print-hide="true"], [data-testid="print-hide"] { display: none !important; }
  [data-testid="report-reading"], [data-testid^="report-reading-"] { break-inside: avoid; }
}
@media print and (prefers-color-scheme: dark) {
  #root * { color: ${Colors.light.text} !important; background-color: transparent !important; border-color: ${Colors.light.border} !important; }
}`;

/**
 * The stack header above the screen holding `el`. React Navigation renders a screen as
 * two siblings, its header (with the title as a heading) before its content; the header
 * has no role or test id of its own, so it is found by that shape.
 */
function screenHeader(el: Element | null): Element | null {
  for (let e = el; e?.parentElement; e = e.parentElement) {
    const before = e.previousElementSibling;
    if (before?.querySelector('h1, [role="heading"]')) return before;
  }
  return null;
}

/** A "Print" button (window.print) that also installs the report's print stylesheet. */
export function PrintButton({ testID = 'report-print' }: PrintButtonProps) {
  useEffect(() => {
    if (document.getElementById(STYLE_ID)) return undefined;
    const style = document.createElement('style');
    style.id = STYLE_ID;
    style.textContent = PRINT_CSS;
    document.head.appendChild(style);
    // Mark the app's header so the print rules can leave it off the paper.
    const header = screenHeader(document.querySelector('[data-testid="print-hide"]'));
    header?.setAttribute('data-print-hide', 'true');
    return () => {
      style.remove();
      header?.removeAttribute('data-print-hide');
    };
  }, []);
  return (
    <View testID="print-hide" style={styles.wrap}>
      <Button label="Print" onPress={() => window.print()} testID={testID} />
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { flexDirection: 'row' } });
