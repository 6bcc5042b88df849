/** Team URL names: lower-case letters, digits and single inner hyphens, 2–40 characters. Client-safe. */
export const SLUG_PATTERN = /^[a-z0-9](?:[a-z0-9]|-(?=[a-z0-9])){1,39}$/;
