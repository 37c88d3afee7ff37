import { Link } from 'react-router';
import { paths } from '@/config/paths';

/** The mark (a bell-shaped activity curve) and the name. */
export function Brand() {
  return (
    <Link to={paths.home.href()} className="flex items-center gap-2 text-ink no-underline">
      <svg viewBox="0 0 32 32" className="size-7" aria-hidden="true">
        <rect width="32" height="32" rx="7" fill="#0f5c58" />
        <path d="M5 24h22" stroke="#a9d8d4" strokeWidth="1.5" strokeLinecap="round" />
        <path
          d="M5 23.2C9.5 23 11 8 16 8s6.5 15 11 15.2"
          fill="none"
          stroke="#fff"
          strokeWidth="2.4"
          strokeLinecap="round"
        />
        <circle cx="16" cy="8" r="2.1" fill="#f2c14e" />
      </svg>
      <span className="text-lg font-bold tracking-tight">Bellwether</span>
    </Link>
  );
}
