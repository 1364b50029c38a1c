// Uploaded bytes (photos, thumbnails, roof drawings, pattern files) live in PostgreSQL,
// so app servers keep no state on disk. Reached only through app/infra/storage.server.ts.
import { customType, index, integer, pgTable, text } from "drizzle-orm/pg-core";
import { organization } from "./auth";
import { createdAt, id } from "./columns";

const bytea = customType<{ data: Buffer; driverData: Buffer }>({ dataType: () => "bytea" });

export const storedFile = pgTable(
  "stored_file",
  {
    id: id(),
    organizationId: text("organization_id").notNull().references(() => organization.id, { onDelete: "cascade" }),
    purpose: text("purpose").notNull(),
    fileName: text("file_name").notNull(),
    mediaType: text("media_type").notNull(),
    byteSize: integer("byte_size").notNull(),
    sha256: text("sha256").notNull(),
    bytes: bytea("bytes").notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("stored_file_org_idx").on(t.organizationId)],
);
