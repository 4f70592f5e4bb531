// Message panels. Each tone has a border, a tinted ground, an icon and a leading word, so the
// meaning survives a colour-blind eye, a washed-out screen or a greyscale print.
import type { ReactNode } from 'react';

export type AlertTone = 'danger' | 'caution' | 'ok' | 'info';

const toneClasses: Record<AlertTone, string> = {
  danger: 'bg-danger-bg border-danger-line text-danger-ink',
  caution: 'bg-caution-bg border-caution-line text-caution-ink',
  ok: 'bg-ok-bg border-ok-line text-ok-ink',
  info: 'bg-info-bg border-info-line text-info-ink',
};

const toneIcons: Record<AlertTone, string> = {
  danger: '✕',
  caution: '!',
  ok: '✓',
  info: 'i',
};

const toneWords: Record<AlertTone, string> = {
  danger: 'Problem',
  caution: 'Caution',
  ok: 'Done',
  info: 'Note',
};

interface AlertProps {
  tone: AlertTone;
  /** Replaces the tone's default leading word ("Problem", "Caution", …). */
  title?: ReactNode;
  children?: ReactNode;
  /** "alert" interrupts a screen reader; use it for errors the person just caused. */
  role?: 'alert' | 'status';
  id?: string;
  className?: string;
}

export function Alert({ tone, title, children, role, id, className = '' }: AlertProps) {
  return (
    <div
      id={id}
      role={role}
      className={`flex gap-3 rounded-panel border-2 border-l-8 p-4 ${toneClasses[tone]} ${className}`}
    >
      <span
        aria-hidden="true"
        className="flex size-8 shrink-0 items-center justify-center rounded-full border-2 border-current text-base font-bold"
      >
        {toneIcons[tone]}
      </span>
      <div className="flex min-w-0 flex-col gap-1">
        <p className="font-bold">{title ?? toneWords[tone]}</p>
        {children ? <div className="flex flex-col gap-2">{children}</div> : null}
      </div>
    </div>
  );
}

/**
 * A safety note. Always the caution tone and always headed with the word "Caution", so a person
 * learns to stop at it wherever it appears.
 */
export function SafetyNote({ children }: { children: ReactNode }) {
  return (
    <Alert tone="caution" title="Caution">
      {children}
    </Alert>
  );
}
