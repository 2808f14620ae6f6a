package com.crustplan.system;

import org.springframework.beans.factory.annotation.Value;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.RequestParam;

@Controller
class SignInController {

	private final boolean demo;

	private final SignInThrottle throttle;

	SignInController(@Value("${crustplan.demo.enabled:false}") boolean demo, SignInThrottle throttle) {
		this.demo = demo;
		this.throttle = throttle;
	}

	/** {@code locked} is the wait in minutes (from the sign-in failure); anything else shows the full period. */
	@GetMapping("/signin")
	String signIn(@RequestParam(name = "locked", required = false) String locked, Model model) {
		long full = Math.max(1, throttle.cooling().toMinutes());
		long minutes = full;
		if (locked != null && locked.matches("[0-9]{1,4}")) {
			minutes = Math.min(full, Math.max(1, Long.parseLong(locked)));
		}
		model.addAttribute("lockMinutes", minutes);
		model.addAttribute("demo", demo);
		model.addAttribute("demoAccounts", demo ? DemoKitchenLoader.DEMO_ACCOUNTS : java.util.List.of());
		return "system/signin";
	}

	/** The page shown when a signed-in user's role does not allow a page. */
	@org.springframework.web.bind.annotation.RequestMapping("/error/403")
	String forbidden(jakarta.servlet.http.HttpServletRequest request, jakarta.servlet.http.HttpServletResponse response,
			Model model) {
		response.setStatus(403);
		// a form sent with a stale token is not a question of role: say what to do instead
		Object denied = request.getAttribute(org.springframework.security.web.WebAttributes.ACCESS_DENIED_403);
		model.addAttribute("staleForm", denied instanceof org.springframework.security.web.csrf.CsrfException);
		return "error/403";
	}

}
