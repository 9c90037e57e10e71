import { useEffect } from 'preact/hooks';

/**
 * Follows the Office theme where the host reports one (light, dark, high contrast); elsewhere the
 * stylesheet's prefers-color-scheme and forced-colors rules apply.
 */
export function useOfficeTheme(): void {
  useEffect(() => {
    const theme = typeof Office !== 'undefined' ? Office.context?.officeTheme : undefined;
    if (!theme) return;
    const root = document.documentElement.style;
    root.setProperty('--pane-background', theme.bodyBackgroundColor);
    root.setProperty('--pane-text', theme.bodyForegroundColor);
    root.setProperty('--pane-control', theme.controlBackgroundColor);
    root.setProperty('--pane-control-text', theme.controlForegroundColor);
  }, []);
}
