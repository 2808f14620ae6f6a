package com.crustplan.surface;

import java.util.List;

import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

import com.crustplan.system.NotFoundException;
import com.crustplan.system.StaleEditException;

/** Saved surfaces; each write is one transaction, so a failed save changes nothing. */
@Service
public class SurfaceService {

	private final SurfaceRepository surfaces;

	SurfaceService(SurfaceRepository surfaces) {
		this.surfaces = surfaces;
	}

	@Transactional(readOnly = true)
	public List<SavedSurface> all() {
		return surfaces.findAllByOrderByNameAsc();
	}

	@Transactional(readOnly = true)
	public SavedSurface get(long id) {
		return surfaces.findById(id).orElseThrow(() -> new NotFoundException("Surface", id));
	}

	/** The form must have passed validation and {@link SurfaceForm#toSurface()}. */
	@Transactional
	public SavedSurface create(SurfaceForm form) {
		form.toSurface();
		form.toProduct();
		return surfaces.save(SavedSurface.from(form));
	}

	/**
	 * Saves an edit made on the version {@code expectedVersion} of the record. Throws
	 * {@link StaleEditException} when the saved record is at another version (or none was
	 * given), and a {@code ConcurrencyFailureException} at commit when another save got
	 * in between.
	 */
	@Transactional
	public SavedSurface update(long id, SurfaceForm form, Integer expectedVersion) {
		form.toSurface();
		form.toProduct();
		SavedSurface s = surfaces.findById(id).orElseThrow(() -> new NotFoundException("Surface", id));
		if (expectedVersion == null || expectedVersion != s.getVersion()) {
			throw new StaleEditException("Surface", id);
		}
		s.update(form);
		return s;
	}

	@Transactional
	public void delete(long id) {
		SavedSurface s = surfaces.findById(id).orElseThrow(() -> new NotFoundException("Surface", id));
		surfaces.delete(s);
	}

	@Transactional(readOnly = true)
	public long count() {
		return surfaces.count();
	}

}
