import { useSearchParams } from 'react-router';
import { patchParams, type ParamPatch } from './list-params';

/** A register's filters, read from the URL, and the one way to change them. */
export function useListParams<F>(read: (params: URLSearchParams) => F) {
  const [searchParams, setSearchParams] = useSearchParams();
  const filters = read(searchParams);
  const update = (patch: ParamPatch) => setSearchParams(patchParams(searchParams, patch));
  return { filters, update };
}
