/**
 * What a photo upload may be, said once for the browser and the server (no sharp here, so a
 * client component can import it): the garage's and the work order's uploads use the same.
 */

/** 10 MB: a phone's full-size JPEG fits; anything larger is refused before it is read. */
export const MAX_PHOTO_BYTES = 10 * 1024 * 1024;
/** The types the store keeps (checked again on the server from the file's first bytes). */
export const PHOTO_ACCEPT = "image/jpeg,image/png,image/webp";
export const PHOTO_TOO_BIG = "That file is larger than 10 MB. Resize it or pick a smaller one.";
/** The browser's own refusal, naming the file, before anything is sent. */
export const photoTooBigFor = (name: string) => `${name} is larger than 10 MB. Resize it or pick a smaller one.`;
export const PHOTO_HINT = "JPEG, PNG or WebP, up to 10 MB. Location data is removed.";
