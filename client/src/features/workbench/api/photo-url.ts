/** The address of an item's photo; the browser loads it as an image, so this is a link, not a query. */
export const photoUrl = (photoId: string) => `/api/photos/${photoId}`;
