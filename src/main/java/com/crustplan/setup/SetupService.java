package com.crustplan.setup;

import java.util.List;

import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

import com.crustplan.system.NotFoundException;

/** Saved heat setups; each write is one transaction. */
@Service
public class SetupService {

	private final SetupRepository setups;

	SetupService(SetupRepository setups) {
		this.setups = setups;
	}

	@Transactional(readOnly = true)
	public List<SavedSetup> all() {
		return setups.findAllByOrderByNameAsc();
	}

	@Transactional(readOnly = true)
	public SavedSetup get(long id) {
		return setups.findById(id).orElseThrow(() -> new NotFoundException("Setup", id));
	}

	@Transactional
	public SavedSetup create(SetupForm form) {
		form.toHeatSetup();
		return setups.save(SavedSetup.from(form));
	}

	@Transactional
	public SavedSetup update(long id, SetupForm form) {
		form.toHeatSetup();
		SavedSetup s = setups.findById(id).orElseThrow(() -> new NotFoundException("Setup", id));
		s.update(form);
		return s;
	}

	@Transactional
	public void delete(long id) {
		setups.delete(setups.findById(id).orElseThrow(() -> new NotFoundException("Setup", id)));
	}

}
