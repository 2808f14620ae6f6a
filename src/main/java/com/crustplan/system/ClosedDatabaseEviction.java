package com.crustplan.system;

import java.sql.SQLException;

import com.zaxxer.hikari.SQLExceptionOverride;

/**
 * Tells the connection pool to drop a connection whose embedded H2 database has closed
 * itself (after a full disk or an I/O error H2 closes the store and every pooled
 * connection answers "database is closed"). Dropped connections are replaced by new ones,
 * which reopen the file, so the app recovers once space is freed, without a restart.
 * PostgreSQL's broken connections (SQLState class 08) are already dropped by the pool
 * itself.
 */
public class ClosedDatabaseEviction implements SQLExceptionOverride {

	/**
	 * H2 error codes (org.h2.api.ErrorCode, H2 2.x): 90098 DATABASE_IS_CLOSED, 90028
	 * IO_EXCEPTION_1, 90031 IO_EXCEPTION_2, 90030 FILE_CORRUPTED_1, 90097
	 * DATABASE_IS_READ_ONLY, 50000 GENERAL_ERROR_1 (how a store failure surfaces).
	 */
	static final int[] EVICT = { 90098, 90028, 90031, 90030, 90097, 50000 };

	// no @Override: the interface's nested enum named Override hides the annotation here
	public Override adjudicate(SQLException e) {
		for (SQLException s = e; s != null; s = s.getNextException()) {
			for (int code : EVICT) {
				if (s.getErrorCode() == code) {
					return Override.MUST_EVICT;
				}
			}
		}
		return Override.CONTINUE_EVICT;
	}

}
