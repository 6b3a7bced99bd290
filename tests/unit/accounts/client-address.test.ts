import { describe, it, expect } from "vitest";
import { UNTRUSTED_ADDRESS, clientAddress, trustedHops } from "@/lib/server/client-address";

const h = (xff?: string) => new Headers(xff === undefined ? {} : { "x-forwarded-for": xff });

describe("client address for sign-in limits", () => {
  it("ignores X-Forwarded-For unless TRUST_PROXY is set", () => {
    expect(trustedHops(undefined)).toBe(0);
    expect(trustedHops("")).toBe(0);
    expect(trustedHops("false")).toBe(0);
    expect(trustedHops("true")).toBe(1);
    expect(trustedHops("2")).toBe(2);
    expect(clientAddress(h("203.0.113.9"), 0)).toBe(UNTRUSTED_ADDRESS);
    expect(clientAddress(h(), 0)).toBe(UNTRUSTED_ADDRESS);
  });

  it("with trusted proxies, takes the entry they appended, not what the client wrote further left", () => {
    expect(clientAddress(h("198.51.100.4"), 1)).toBe("198.51.100.4");
    expect(clientAddress(h("6.6.6.6, 198.51.100.4"), 1)).toBe("198.51.100.4");
    expect(clientAddress(h("6.6.6.6, 198.51.100.4, 10.0.0.2"), 2)).toBe("198.51.100.4");
    expect(clientAddress(h("198.51.100.4"), 3)).toBe("198.51.100.4");
    expect(clientAddress(h("2001:DB8::1"), 1)).toBe("2001:db8::1");
    expect(clientAddress(h("[2001:db8::1]:443"), 1)).toBe("2001:db8::1");
  });

  it("answers the untrusted address for missing or malformed entries", () => {
    expect(clientAddress(h(), 1)).toBe(UNTRUSTED_ADDRESS);
    expect(clientAddress(h(" , "), 1)).toBe(UNTRUSTED_ADDRESS);
    expect(clientAddress(h("not-an-address"), 1)).toBe(UNTRUSTED_ADDRESS);
    expect(clientAddress(h("9".repeat(2_000_000)), 1)).toBe(UNTRUSTED_ADDRESS);
  });
});
