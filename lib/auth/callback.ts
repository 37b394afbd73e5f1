/** Only same-site paths are followed after sign-in, so a crafted link can't send someone elsewhere. */
export function safeCallback(value: string | undefined | null): string {
  if (!value || !value.startsWith("/") || value.startsWith("//") || value.startsWith("/\\")) return "/home";
  return value;
}
