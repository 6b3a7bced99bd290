/** Benchwright's mark: a bench top seen end-on with a square's blade rising from it. */
export function LogoMark({ size = 28, className = "" }: { size?: number; className?: string }) {
  return (
    <svg width={size} height={size} viewBox="0 0 32 32" role="img" aria-label="Benchwright" className={className}>
      <rect x="1" y="1" width="30" height="30" rx="7" fill="#4b3423" />
      <path d="M6 19h20v3H6z" fill="#f7f2e8" />
      <path d="M9 22h2.5v5H9zM20.5 22H23v5h-2.5z" fill="#e2d6c8" />
      <path d="M18 5h3v14h-3z" fill="#d99a1e" />
      <path d="M18 5h8v3h-8z" fill="#d99a1e" />
      <path d="M19 10h1M19 13h1M19 16h1" stroke="#4b3423" strokeWidth="1" />
    </svg>
  );
}
