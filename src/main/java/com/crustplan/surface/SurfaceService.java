package com.crustplan.surface;

import java.util.List;

import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

import com.crustplan.system.NotFoundException;

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

	@Transactional
	public SavedSurface update(long id, SurfaceForm form) {
		form.toSurface();
		form.toProduct();
		SavedSurface s = surfaces.findById(id).orElseThrow(() -> new NotFoundException("Surface", id));
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
