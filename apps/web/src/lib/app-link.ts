/** A path of the app as a full address, as a printed QR code must carry it (a phone's camera opens it in the browser). */
export function appLink(path: string, origin: string = window.location.origin): string {
  return new URL(path, origin).href;
}
