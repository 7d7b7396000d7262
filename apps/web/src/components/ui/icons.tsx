import type { ReactNode } from 'react';
import { cx } from '../../lib/cx';

function Icon({ className, children }: { className?: string | undefined; children: ReactNode }) {
  return (
    <svg
      aria-hidden="true"
      viewBox="0 0 24 24"
      className={cx('size-5 shrink-0 fill-none stroke-current stroke-[1.8]', className)}
      strokeLinecap="round"
      strokeLinejoin="round"
    >
      {children}
    </svg>
  );
}

type IconProps = { className?: string };

export const TodayIcon = ({ className }: IconProps) => (
  <Icon className={className}>
    <circle cx="12" cy="12" r="4" />
    <path d="M12 3v2M12 19v2M3 12h2M19 12h2M5.6 5.6 7 7M17 17l1.4 1.4M5.6 18.4 7 17M17 7l1.4-1.4" />
  </Icon>
);

export const PiecesIcon = ({ className }: IconProps) => (
  <Icon className={className}>
    <rect x="3" y="6" width="18" height="12" rx="2" />
    <path d="M9 6c1 3-1 5 0 8s3 3 3 4M14 6c-1 2 1 4 0 6" />
  </Icon>
);

export const MouldsIcon = ({ className }: IconProps) => (
  <Icon className={className}>
    <path d="M3 8h18v10H3z" />
    <path d="M7 8v4a5 5 0 0 0 10 0V8" />
  </Icon>
);

export const PourPlanIcon = ({ className }: IconProps) => (
  <Icon className={className}>
    <path d="M6 4h12l-1.5 16h-9z" />
    <path d="M6.8 10h10.4M7.3 15h9.4" />
  </Icon>
);

export const CureBoardIcon = ({ className }: IconProps) => (
  <Icon className={className}>
    <circle cx="12" cy="13" r="8" />
    <path d="M12 9v4l3 2M10 2h4" />
  </Icon>
);

export const ShelfIcon = ({ className }: IconProps) => (
  <Icon className={className}>
    <path d="M3 20h18M3 12h18M5 12V5h4v7M10 12V7h4v5M6 20v-5h3v5M15 20v-6h4v6" />
  </Icon>
);

export const TeamIcon = ({ className }: IconProps) => (
  <Icon className={className}>
    <circle cx="9" cy="8" r="3" />
    <path d="M3 20c0-3.3 2.7-6 6-6s6 2.7 6 6M16 5.5a3 3 0 0 1 0 5.5M18 14.5c1.8.8 3 2.9 3 5.5" />
  </Icon>
);

export const AuditIcon = ({ className }: IconProps) => (
  <Icon className={className}>
    <path d="M6 3h9l4 4v14H6z" />
    <path d="M9 11h7M9 15h7M9 7h3" />
  </Icon>
);

export const SettingsIcon = ({ className }: IconProps) => (
  <Icon className={className}>
    <path d="M4 7h9M17 7h3M4 17h3M11 17h9" />
    <circle cx="15" cy="7" r="2" />
    <circle cx="9" cy="17" r="2" />
  </Icon>
);

export const MenuIcon = ({ className }: IconProps) => (
  <Icon className={className}>
    <path d="M4 7h16M4 12h16M4 17h16" />
  </Icon>
);

export const CloseIcon = ({ className }: IconProps) => (
  <Icon className={className}>
    <path d="M6 6l12 12M18 6 6 18" />
  </Icon>
);

export const PlusIcon = ({ className }: IconProps) => (
  <Icon className={className}>
    <path d="M12 5v14M5 12h14" />
  </Icon>
);
