import { describe, expect, test } from "vitest";
import { clientAddressOf, trustedProxyHops } from "@/lib/net/client-address.mjs";

// X-Forwarded-For: each proxy appends the address it received the request from (MDN, "X-Forwarded-For";
// RFC 7239 §5.2 for the same rule in Forwarded). Only entries added by trusted proxies are believed.
describe("clientAddressOf", () => {
  test.each([
    {
      what: "no proxy: the socket, whatever the client wrote",
      socketAddress: "198.51.100.9",
      forwardedFor: "203.0.113.1",
      hops: 0,
      want: "198.51.100.9",
    },
    {
      what: "no proxy, IPv4-mapped IPv6 socket",
      socketAddress: "::ffff:198.51.100.9",
      forwardedFor: undefined,
      hops: 0,
      want: "198.51.100.9",
    },
    { what: "one proxy: the entry it appended", socketAddress: "10.0.0.2", forwardedFor: "203.0.113.1", hops: 1, want: "203.0.113.1" },
    {
      what: "one proxy: a forged entry before it is ignored",
      socketAddress: "10.0.0.2",
      forwardedFor: "6.6.6.6, 203.0.113.1",
      hops: 1,
      want: "203.0.113.1",
    },
    {
      what: "two proxies: the second from the right",
      socketAddress: "10.0.0.3",
      forwardedFor: "6.6.6.6, 203.0.113.1, 10.0.0.2",
      hops: 2,
      want: "203.0.113.1",
    },
    {
      what: "header repeated: joined in order",
      socketAddress: "10.0.0.3",
      forwardedFor: ["6.6.6.6", "203.0.113.1, 10.0.0.2"],
      hops: 2,
      want: "203.0.113.1",
    },
    {
      what: "fewer entries than hops: the peer bypassed a proxy",
      socketAddress: "198.51.100.9",
      forwardedFor: "203.0.113.1",
      hops: 2,
      want: "198.51.100.9",
    },
    { what: "no socket address", socketAddress: undefined, forwardedFor: undefined, hops: 0, want: "unknown" },
  ])("$what", ({ socketAddress, forwardedFor, hops, want }) => expect(clientAddressOf({ socketAddress, forwardedFor, hops })).toBe(want));
});

describe("trustedProxyHops", () => {
  test.each([
    [undefined, 0],
    ["", 0],
    ["0", 0],
    ["2", 2],
  ])("%s → %i", (value, hops) => expect(trustedProxyHops(value)).toBe(hops));
  test.each(["-1", "1.5", "many", "11"])("refuses %s", (value) => expect(() => trustedProxyHops(value)).toThrow(/TRUSTED_PROXY_HOPS/));
});
