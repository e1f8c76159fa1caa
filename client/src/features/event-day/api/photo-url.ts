/** The address of an item's photo; the browser loads it in an <img>, so this is a link, not a query. */
export const photoUrl = (photoId: string) => `/api/photos/${photoId}`;
