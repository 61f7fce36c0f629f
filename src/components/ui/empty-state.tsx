import type { ReactNode } from 'react';
import { Icon, type IconName } from './icon';

interface EmptyStateProps {
  title: string;
  children?: ReactNode;
  icon?: IconName;
  action?: ReactNode;
  /** h1 when the empty state is the whole screen. */
  titleAs?: 'h1' | 'h2' | 'p';
}

export function EmptyState({ title, children, icon = 'inbox', action, titleAs: Title = 'p' }: EmptyStateProps) {
  return (
    <div className="flex flex-col items-center gap-3 px-4 py-10 text-center">
      <span className="text-muted">
        <Icon name={icon} size={40} />
      </span>
      <Title className="text-lg font-semibold">{title}</Title>
      {children && <div className="max-w-prose text-muted">{children}</div>}
      {action}
    </div>
  );
}
