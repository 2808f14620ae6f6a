package com.crustplan.surface;

import java.util.List;

import org.springframework.data.jpa.repository.JpaRepository;

public interface SurfaceRepository extends JpaRepository<SavedSurface, Long> {

	List<SavedSurface> findAllByOrderByNameAsc();

}
