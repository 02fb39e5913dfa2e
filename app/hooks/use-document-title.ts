// Sets the browser tab's title per page, so screen-reader users hear where a navigation landed.
import { useEffect } from 'react';

export function useDocumentTitle(title: string | null | undefined): void {
  useEffect(() => {
    document.title = title ? `${title} · Lobewright` : 'Lobewright';
  }, [title]);
}
