/** Tiles that are radio buttons: the focus ring shows on the tile. */
export const TILE_FOCUS =
  'has-[:focus-visible]:ring-2 has-[:focus-visible]:ring-copper has-[:focus-visible]:ring-offset-2';
