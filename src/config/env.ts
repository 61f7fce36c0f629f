export const env = {
  apiBase: (import.meta.env.VITE_API_BASE as string | undefined) ?? '/api',
} as const;
