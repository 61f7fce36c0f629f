import { Link, type LinkProps } from 'react-router';
import { cx } from '../../lib/cx';

export const linkClasses = 'text-accent underline-offset-2 hover:underline';

export function TextLink({ className, ...props }: LinkProps) {
  return <Link className={cx(linkClasses, className)} {...props} />;
}

/** "← Cook runs" above a detail page. */
export function BackLink({ to, children }: { to: string; children: string }) {
  return (
    <p className="no-print mb-2">
      <TextLink to={to}>← {children}</TextLink>
    </p>
  );
}
