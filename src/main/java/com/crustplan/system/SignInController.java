package com.crustplan.system;

import java.util.List;

import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;

import org.springframework.beans.factory.ObjectProvider;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.security.web.WebAttributes;
import org.springframework.security.web.csrf.CsrfException;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;

@Controller
class SignInController {

	private final boolean demo;

	private final ObjectProvider<PublicAccounts> publicAccounts;

	private final SignInThrottle throttle;

	SignInController(@Value("${crustplan.demo.enabled:false}") boolean demo,
			ObjectProvider<PublicAccounts> publicAccounts, SignInThrottle throttle) {
		this.demo = demo;
		this.publicAccounts = publicAccounts;
		this.throttle = throttle;
	}

	/**
	 * {@code locked} is the wait in minutes (from the sign-in failure); anything else
	 * shows the full period.
	 */
	@GetMapping("/signin")
	String signIn(@RequestParam(name = "locked", required = false) String locked, Model model) {
		long full = Math.max(1, throttle.cooling().toMinutes());
		long minutes = full;
		if (locked != null && locked.matches("[0-9]{1,4}")) {
			minutes = Math.min(full, Math.max(1, Long.parseLong(locked)));
		}
		model.addAttribute("lockMinutes", minutes);
		model.addAttribute("demo", demo);
		PublicAccounts shown = demo ? publicAccounts.getIfAvailable() : null;
		model.addAttribute("demoAccounts", shown == null ? List.of() : shown.accounts());
		return "system/signin";
	}

	/** The page shown when a signed-in user's role does not allow a page. */
	@RequestMapping("/error/403")
	String forbidden(HttpServletRequest request, HttpServletResponse response, Model model) {
		response.setStatus(403);
		// a form sent with a stale token is not a question of role: say what to do
		// instead
		Object denied = request.getAttribute(WebAttributes.ACCESS_DENIED_403);
		model.addAttribute("staleForm", denied instanceof CsrfException);
		return "error/403";
	}

}
