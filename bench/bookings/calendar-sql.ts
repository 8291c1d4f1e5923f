// The SQL behind GET /api/bookings?roomId=…&from=…&to=… (listBookings → loadBookingDtos),
// written out by hand for mysql2: the bookings with their room, client and project, then the
// engineers and the kit of those bookings. It measures what the database alone costs.
import type { Pool, RowDataPacket } from "mysql2/promise";
import { maxBookingMinutes } from "@takeup/domain";

const roomColumns = ["id", "name", "description", "capacity", "colour", "turnover_minutes", "position", "active", "created_at", "updated_at"];

const bookingsSql =
  `SELECT b.*, ${roomColumns.map((c) => `r.${c} AS room_${c}`).join(", ")}, c.name AS client_name, p.name AS project_name
     FROM bookings b
     JOIN rooms r ON r.id = b.room_id
     JOIN client_accounts c ON c.id = b.client_account_id
     LEFT JOIN projects p ON p.id = b.project_id
    WHERE b.starts_at >= ? AND b.starts_at < ? AND b.ends_at > ? AND b.room_id = ?
    ORDER BY b.starts_at, b.id
    LIMIT 2000`;
const engineersSql = `SELECT be.booking_id, sp.user_id, sp.display_name, sp.engineer_grade
     FROM booking_engineers be JOIN staff_profiles sp ON sp.user_id = be.staff_user_id
    WHERE be.booking_id IN (?) ORDER BY sp.display_name`;
const equipmentSql = `SELECT bq.booking_id, e.id, e.name
     FROM booking_equipment bq JOIN equipment e ON e.id = bq.equipment_id
    WHERE bq.booking_id IN (?) ORDER BY e.name`;

export type CalendarRows = { bookings: RowDataPacket[]; engineers: RowDataPacket[]; equipment: RowDataPacket[] };

export async function calendarWeekRows(pool: Pool, roomId: number, from: Date, to: Date): Promise<CalendarRows> {
  // Same lower bound as the service: the longest allowed booking before the window.
  const earliest = new Date(from.getTime() - maxBookingMinutes * 60_000);
  const [bookings] = await pool.query<RowDataPacket[]>(bookingsSql, [earliest, to, from, roomId]);
  if (bookings.length === 0) return { bookings, engineers: [], equipment: [] };
  const ids = bookings.map((b) => b.id as number);
  const [engineers] = await pool.query<RowDataPacket[]>(engineersSql, [ids]);
  const [equipment] = await pool.query<RowDataPacket[]>(equipmentSql, [ids]);
  return { bookings, engineers, equipment };
}
