import type { ReactNode } from 'react';
import { cx } from '../../lib/cx';
import { Icon } from './icon';

export type NoticeTone = 'info' | 'warn' | 'danger' | 'ok';

const tones: Record<NoticeTone, string> = {
  info: 'border-accent bg-accent-soft text-ink',
  warn: 'border-warn bg-warn-soft text-ink',
  danger: 'border-danger bg-danger-soft text-ink',
  ok: 'border-ok bg-ok-soft text-ink',
};

const iconTones: Record<NoticeTone, string> = {
  info: 'text-accent',
  warn: 'text-warn',
  danger: 'text-danger',
  ok: 'text-ok',
};

interface NoticeProps {
  tone?: NoticeTone;
  title?: string;
  children?: ReactNode;
  action?: ReactNode;
  className?: string;
}

/** A boxed message: cautions, failed loads, results. Callers add role="alert" where it must be announced. */
export function Notice({ tone = 'info', title, children, action, className }: NoticeProps) {
  return (
    <div className={cx('flex gap-3 rounded-lg border-l-4 p-4', tones[tone], className)}>
      <span className={cx('mt-0.5 shrink-0', iconTones[tone])}>
        <Icon name={tone === 'info' || tone === 'ok' ? 'info' : 'alert'} size={22} />
      </span>
      <div className="min-w-0 flex-1 space-y-1">
        {title && <p className="font-semibold">{title}</p>}
        {children && <div>{children}</div>}
        {action && <div className="pt-2">{action}</div>}
      </div>
    </div>
  );
}
