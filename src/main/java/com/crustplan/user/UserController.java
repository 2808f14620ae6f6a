package com.crustplan.user;

import java.util.Arrays;

import jakarta.validation.Valid;

import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.validation.BindingResult;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;

import com.crustplan.system.FormBinding;

/**
 * User management for administrators (the security rules keep everyone else out of
 * /admin).
 */
@Controller
@RequestMapping("/admin/users")
class UserController {

	private final UserService users;

	UserController(UserService users) {
		this.users = users;
	}

	@GetMapping
	String list(Model model) {
		model.addAttribute("users", users.all());
		return "user/list";
	}

	@GetMapping("/new")
	String newForm(Model model) {
		return form(model, UserForm.blank(), null, "/admin/users/new", "New user", true);
	}

	@PostMapping("/new")
	String create(@Valid @ModelAttribute("form") UserForm form, BindingResult result, Model model,
			RedirectAttributes redirect) {
		if (!result.hasErrors()) {
			try {
				UserAccount a = users.create(form);
				redirect.addFlashAttribute("message", "User “" + a.getUsername() + "” created.");
				return "redirect:/admin/users";
			}
			catch (UserService.Refused e) {
				result.rejectValue(e.field(), "refused", e.getMessage());
			}
		}
		return form(model, form, result, "/admin/users/new", "New user", true);
	}

	@GetMapping("/{id}/edit")
	String editForm(@PathVariable long id, Model model) {
		UserAccount a = users.get(id);
		return form(model, UserForm.of(a), null, "/admin/users/" + id + "/edit", "Edit " + a.getUsername(), false);
	}

	@PostMapping("/{id}/edit")
	String update(@PathVariable long id, @Valid @ModelAttribute("form") UserForm form, BindingResult result,
			Model model, RedirectAttributes redirect) {
		UserAccount a = users.get(id);
		if (!result.hasErrors()) {
			try {
				users.update(id, form);
				redirect.addFlashAttribute("message", "User “" + a.getUsername() + "” updated.");
				return "redirect:/admin/users";
			}
			catch (UserService.Refused e) {
				result.rejectValue(e.field(), "refused", e.getMessage());
			}
		}
		return form(model, form, result, "/admin/users/" + id + "/edit", "Edit " + a.getUsername(), false);
	}

	private static String form(Model model, UserForm form, BindingResult errors, String action, String title,
			boolean isNew) {
		// never send a password back to the browser
		FormBinding.put(model, new UserForm(form.username(), form.role(), "", form.enabled()), errors);
		model.addAttribute("action", action);
		model.addAttribute("title", title);
		model.addAttribute("isNew", isNew);
		model.addAttribute("roles", Arrays.asList(Role.values()));
		return "user/form";
	}

}
