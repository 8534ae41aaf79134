import { GARAGE_ACCESS } from "@/lib/garage/access";
import { garageQueries } from "@/lib/garage/queries";
import { guardLayout } from "@/lib/platform/http/guardLayout";

/** The pages of one vehicle (plan, edit, finder, checklist): a vehicle that is missing or someone else's answers HTTP 404 before anything streams. */
export default guardLayout(GARAGE_ACCESS, (caller, id) => garageQueries.findVehicle(caller.userId, id));
