-- Custom SQL migration file, put your code below! ---- The audit trail is append-only: the database itself refuses to change or remove an entry.
CREATE TRIGGER audit_trail_no_update BEFORE UPDATE ON audit_trail
BEGIN
  SELECT RAISE(ABORT, 'audit_trail is append-only');
END;
--> statement-breakpoint
CREATE TRIGGER audit_trail_no_delete BEFORE DELETE ON audit_trail
BEGIN
  SELECT RAISE(ABORT, 'audit_trail is append-only');
END;
