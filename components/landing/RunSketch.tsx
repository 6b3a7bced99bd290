/** A front elevation of a cabinet run with a tool shelf dropped between two counters: the landing page's picture. */
export function RunSketch() {
  const counterY = 60;
  return (
    <svg viewBox="0 0 520 230" className="h-auto w-full" role="img" aria-labelledby="run-sketch-title">
      <title id="run-sketch-title">A run of drawer cabinets with a saw shelf between them; the saw table is flush with both counters, and dashed lines show the clear path for a long board on each side of the blade.</title>
      <rect x="0" y="0" width="520" height="230" fill="#ece3d0" rx="10" />
      {/* stock path */}
      <line x1="10" y1={counterY - 6} x2="510" y2={counterY - 6} stroke="#2f7d4f" strokeWidth="2" strokeDasharray="6 5" />
      <text x="14" y={counterY - 12} fontSize="10" fill="#1f5636">clear path for an 8 ft board</text>
      {/* left cabinets */}
      {[20, 110].map((x) => (
        <g key={x}>
          <rect x={x} y={counterY} width="88" height="8" fill="#7a5a3e" />
          <rect x={x + 4} y={counterY + 8} width="80" height="132" fill="#f4efe9" stroke="#4b3423" />
          {[0, 1, 2].map((i) => (
            <rect key={i} x={x + 8} y={counterY + 12 + i * 43} width="72" height="39" fill="#e2d6c8" stroke="#4b3423" />
          ))}
          <rect x={x + 8} y={counterY + 140} width="72" height="12" fill="#b89c80" />
        </g>
      ))}
      {/* saw bay */}
      <rect x="202" y={counterY + 44} width="116" height="8" fill="#7a5a3e" />
      <rect x="206" y={counterY + 52} width="108" height="88" fill="#f4efe9" stroke="#4b3423" />
      <rect x="220" y={counterY + 8} width="80" height="36" fill="#5b6b7d" rx="3" />
      <circle cx="260" cy={counterY - 10} r="26" fill="none" stroke="#36414e" strokeWidth="3" />
      <rect x="210" y={counterY} width="100" height="8" fill="#36414e" />
      <text x="322" y={counterY + 30} fontSize="10" fill="#4b3423">shelf height = counter − saw table</text>
      <line x1="318" y1={counterY + 4} x2="318" y2={counterY + 48} stroke="#d99a1e" strokeWidth="2" />
      {/* right cabinets */}
      {[324, 414].map((x) => (
        <g key={x}>
          <rect x={x} y={counterY} width="88" height="8" fill="#7a5a3e" />
          <rect x={x + 4} y={counterY + 8} width="80" height="132" fill="#f4efe9" stroke="#4b3423" />
          {[0, 1].map((i) => (
            <rect key={i} x={x + 8} y={counterY + 12 + i * 64} width="72" height="60" fill="#e2d6c8" stroke="#4b3423" />
          ))}
          <rect x={x + 8} y={counterY + 140} width="72" height="12" fill="#b89c80" />
        </g>
      ))}
      {/* stop track */}
      <rect x="330" y={counterY - 3} width="170" height="3" fill="#d99a1e" />
      <rect x="420" y={counterY - 9} width="8" height="6" fill="#8a5f0c" />
      <text x="400" y={counterY + 170} fontSize="10" fill="#4b3423">stop track</text>
      <line x1="0" y1="212" x2="520" y2="212" stroke="#4b3423" />
    </svg>
  );
}
