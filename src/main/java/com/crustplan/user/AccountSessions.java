package com.crustplan.user;

import java.util.Set;

import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.session.FindByIndexNameSessionRepository;
import org.springframework.session.Session;
import org.springframework.stereotype.Component;
import org.springframework.transaction.event.TransactionPhase;
import org.springframework.transaction.event.TransactionalEventListener;

import com.crustplan.system.CredentialCheckCache;

/**
 * Ends a user's open sessions once a change to their role, state or password is
 * committed, so the change counts from their next request: the sessions live in the
 * shared database (Spring Session JDBC), so this reaches every instance. The next request
 * finds no session, is anonymous, and is asked to sign in again, which reads the account
 * afresh. HTTP Basic clients keep no session: their account is read on every request
 * anyway, and the remembered password checks are dropped here.
 * <p>
 * After the commit, not before: a sign-in between the deletion and the commit would
 * otherwise read the old role into a new session.
 */
@Component
class AccountSessions {

	private static final Logger log = LoggerFactory.getLogger(AccountSessions.class);

	private final FindByIndexNameSessionRepository<? extends Session> sessions;

	private final CredentialCheckCache checks;

	AccountSessions(FindByIndexNameSessionRepository<? extends Session> sessions, CredentialCheckCache checks) {
		this.sessions = sessions;
		this.checks = checks;
	}

	@TransactionalEventListener(phase = TransactionPhase.AFTER_COMMIT, fallbackExecution = true)
	void end(AccountChanged change) {
		checks.forget(change.oldPasswordHash());
		try {
			Set<String> ids = sessions.findByPrincipalName(change.username()).keySet();
			ids.forEach(sessions::deleteById);
			log.info("Account '{}' changed: {} open session(s) ended.", change.username(), ids.size());
		}
		catch (RuntimeException e) {
			// the change itself is saved; say loudly that its sessions could not be ended
			log.error("Account '{}' changed but its open sessions could not be ended: {}", change.username(),
					e.toString());
		}
	}

}
