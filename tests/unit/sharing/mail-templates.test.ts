import { describe, it, expect } from "vitest";
import { invitationMessage, resetMessage, verifyMessage } from "@/lib/server/mail/templates";

describe("mail templates", () => {
  const url = "http://127.0.0.1:3000/invite/abc_DEF-123";

  it("puts the same link in the plain-text and the HTML part", () => {
    for (const m of [invitationMessage({ inviterName: "Robin", planName: "Bay 2", role: "editor", url, expiresDays: 14 }), resetMessage({ name: "Robin", url, expiresMinutes: 60 }), verifyMessage({ name: "Robin", url, expiresHours: 48 })]) {
      expect(m.text).toContain(url);
      expect(m.html).toContain(`href="${url}"`);
      expect(m.subject.length).toBeGreaterThan(10);
    }
  });

  it("escapes names in the HTML part", () => {
    const m = invitationMessage({ inviterName: "<b>Eve</b>", planName: 'Shop "A" & B', role: "viewer", url, expiresDays: 14 });
    expect(m.html).not.toContain("<b>Eve</b>");
    expect(m.html).toContain("&lt;b&gt;Eve&lt;/b&gt;");
    expect(m.html).toContain("Shop &quot;A&quot; &amp; B");
    expect(m.text).toContain("look at it (without changing it)");
  });

  it("states how long each link works", () => {
    expect(resetMessage({ name: "R", url, expiresMinutes: 60 }).text).toContain("60 minutes");
    expect(verifyMessage({ name: "R", url, expiresHours: 48 }).text).toContain("48 hours");
    expect(invitationMessage({ inviterName: "R", planName: "P", role: "editor", url, expiresDays: 14 }).text).toContain("14 days");
  });
});
