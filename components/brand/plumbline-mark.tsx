/** The Plumbline mark: a cord from a beam to a pointed bob, with the ground line it is measured to. */
export function PlumblineMark({ className = 'h-8 w-8', title }: { className?: string; title?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} role={title ? 'img' : undefined} aria-hidden={title ? undefined : true}>
      {title ? <title>{title}</title> : null}
      <rect x="6" y="3" width="20" height="3" rx="1.5" fill="#1b2430" />
      <line x1="16" y1="6" x2="16" y2="15" stroke="#1f6f78" strokeWidth="1.6" />
      <path d="M12 15h8l-4 11z" fill="#a9771a" />
      <circle cx="16" cy="15" r="1.4" fill="#6b4a0e" />
      <line x1="7" y1="29" x2="25" y2="29" stroke="#1b2430" strokeWidth="1.6" strokeDasharray="2 2" />
    </svg>
  );
}

export function Wordmark({ className = '' }: { className?: string }) {
  return (
    <span className={`inline-flex items-center gap-2 ${className}`}>
      <PlumblineMark className="h-8 w-8" />
      <span className="text-lg font-bold tracking-tight text-ink">Plumbline</span>
    </span>
  );
}
