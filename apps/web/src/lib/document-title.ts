// Sets the browser tab's title per screen, so a tablet left on a trolley shows where it is.
import { useEffect } from 'react';

export function useDocumentTitle(title: string): void {
  useEffect(() => {
    document.title = `${title} · Heatpath`;
  }, [title]);
}
