// TanStack Query for this group's pages (app/QueryLayout.tsx says why it is not in the root layout).
export { default } from "@/app/QueryLayout";
