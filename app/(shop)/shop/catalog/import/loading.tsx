// Below the segment's guard (if any): loading boundaries sit on the shop's leaf pages, none above
// /shop/quotes/[id] or /shop/work-orders/[id], whose layouts answer 404 before anything streams.
export { default } from "@/components/feedback/SegmentLoading";
