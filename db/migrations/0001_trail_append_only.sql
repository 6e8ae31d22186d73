-- The decision trail is append-only: the database itself refuses to change or remove an event.
CREATE TRIGGER trail_events_no_update BEFORE UPDATE ON trail_events FOR EACH ROW
  SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'trail_events is append-only: UPDATE refused';
--> statement-breakpoint
CREATE TRIGGER trail_events_no_delete BEFORE DELETE ON trail_events FOR EACH ROW
  SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'trail_events is append-only: DELETE refused';
