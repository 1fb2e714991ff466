import type { PassClaims, PassPayload } from "./pass-claims-schema";
import { uuidToBase64Url } from "./uuid-to-base64url";

/** Pass claims as they are signed: members in a fixed order, ids as 22 base64url characters. */
export function toPassPayload(claims: PassClaims): PassPayload {
  return {
    evt: uuidToBase64Url(claims.evt),
    ent: uuidToBase64Url(claims.ent),
    car: claims.car,
    iat: claims.iat,
    exp: claims.exp,
    jti: uuidToBase64Url(claims.jti),
  };
}
