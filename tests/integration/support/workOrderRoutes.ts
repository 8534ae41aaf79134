/**
 * The work order's route handlers as the counter's pages call them: open one for a booked quote,
 * read it, sign a step, move it along. Loaded when called, so after the test file's mocks and
 * settings, as the files' own route imports are.
 */
export async function workOrderRoutes() {
  return {
    open: (await import("@/app/api/shop/work-orders/route")).POST,
    read: (await import("@/app/api/shop/work-orders/[id]/route")).GET,
    sign: (await import("@/app/api/shop/work-orders/[id]/steps/route")).PUT,
    move: (await import("@/app/api/shop/work-orders/[id]/status/route")).POST,
  };
}
