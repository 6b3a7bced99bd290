import Link from "next/link";
import { LogoMark } from "./Logo";
import { SignOutButton } from "./SignOutButton";

export interface HeaderUser {
  name: string;
  role: string;
}

/** Site header: the mark, navigation, and the sign-in state (rendered on the server). */
export function Header({ user }: { user: HeaderUser | null }) {
  return (
    <header className="no-print border-b border-walnut-100 bg-paper/90 backdrop-blur">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3">
        <Link href="/" className="flex items-center gap-2 font-semibold tracking-tight text-walnut-900">
          <LogoMark />
          <span className="text-lg">Benchwright</span>
        </Link>
        <nav aria-label="Main" className="flex flex-1 flex-wrap items-center gap-4 text-sm text-walnut-700">
          {user && <Link href="/plans" className="hover:text-walnut-900">My plans</Link>}
          <Link href="/rules" className="hover:text-walnut-900">Clearance rules</Link>
          <Link href="/class" className="hover:text-walnut-900">Class</Link>
          {(user?.role === "instructor" || user?.role === "admin") && <Link href="/presets" className="hover:text-walnut-900">Rule presets</Link>}
          {user?.role === "admin" && <Link href="/admin" className="hover:text-walnut-900">Accounts</Link>}
        </nav>
        <div className="flex items-center gap-3 text-sm">
          {user ? (
            <>
              <span className="text-walnut-700" data-testid="signed-in-as">
                {user.name}
                {user.role !== "member" && <span className="ml-1 rounded bg-walnut-100 px-1.5 py-0.5 text-xs">{user.role}</span>}
              </span>
              <SignOutButton />
            </>
          ) : (
            <>
              <Link href="/signin" className="text-walnut-700 hover:text-walnut-900">Sign in</Link>
              <Link href="/signup" className="rounded-md bg-walnut-700 px-3 py-1.5 font-medium text-paper hover:bg-walnut-900">Create an account</Link>
            </>
          )}
        </div>
      </div>
    </header>
  );
}
