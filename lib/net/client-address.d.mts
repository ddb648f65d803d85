export declare const CLIENT_ADDRESS_HEADER: string;
export declare function trustedProxyHops(value: string | undefined): number;
export declare function clientAddressOf(input: {
  socketAddress: string | undefined;
  forwardedFor: string | string[] | undefined;
  hops: number;
}): string;
