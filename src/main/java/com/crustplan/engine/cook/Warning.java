package com.crustplan.engine.cook;

/** Something a cook should know before following a plan: a stable code and a plain sentence. */
public record Warning(String code, Severity severity, String message) {

	public enum Severity {
		/** Could hurt someone or break a rule of practice. */
		SAFETY,
		/** The plan may not give what was asked. */
		QUALITY,
		/** Worth knowing. */
		NOTE
	}

}
