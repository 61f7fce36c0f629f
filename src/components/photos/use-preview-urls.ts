import { useEffect, useState } from 'react';

/**
 * Object URLs for previews of picked files. Each holds its file in memory until revoked, so those not
 * released by hand are revoked when the component leaves the page.
 */
export function usePreviewUrls() {
  const [urls] = useState(() => {
    const made = new Set<string>();
    return {
      made,
      make(file: File) {
        const url = URL.createObjectURL(file);
        made.add(url);
        return url;
      },
      release(url: string) {
        URL.revokeObjectURL(url);
        made.delete(url);
      },
    };
  });
  useEffect(
    () => () => {
      for (const url of urls.made) URL.revokeObjectURL(url);
      urls.made.clear();
    },
    [urls],
  );
  return urls;
}
