import type { Metadata } from "next";
import { ResetRequestForm } from "@/components/sharing/ResetForms";

export const metadata: Metadata = { title: "Forgot your password" };

export default function ResetRequestPage() {
  return (
    <div className="mx-auto max-w-sm px-4 py-12">
      <h1 className="mb-2 text-2xl font-semibold text-walnut-900">Forgot your password?</h1>
      <p className="mb-6 text-sm text-walnut-700">We will e-mail a link to choose a new one. It works once, for an hour.</p>
      <ResetRequestForm />
    </div>
  );
}
