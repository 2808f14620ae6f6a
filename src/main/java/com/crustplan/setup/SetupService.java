package com.crustplan.setup;

import java.util.List;

import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

import com.crustplan.system.NotFoundException;
import com.crustplan.system.StaleEditException;

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

	/**
	 * As for surfaces: refused with {@link StaleEditException} unless made on the saved
	 * version.
	 */
	@Transactional
	public SavedSetup update(long id, SetupForm form, Integer expectedVersion) {
		form.toHeatSetup();
		SavedSetup s = setups.findById(id).orElseThrow(() -> new NotFoundException("Setup", id));
		if (expectedVersion == null || expectedVersion != s.getVersion()) {
			throw new StaleEditException("Setup", id);
		}
		s.update(form);
		return s;
	}

	@Transactional
	public void delete(long id) {
		setups.delete(setups.findById(id).orElseThrow(() -> new NotFoundException("Setup", id)));
	}

}
