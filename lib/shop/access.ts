/** Who works the shop's desk: its staff and its owner (owner-only screens say so themselves). */
export const SHOP_DESK_ACCESS = ["shop_staff", "shop_owner"] as const;
