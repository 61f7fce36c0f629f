import { NotFound } from '../../components/errors/not-found';

export function NotFoundRoute() {
  return (
    <>
      <title>Not found · Asepta</title>
      <NotFound />
    </>
  );
}
