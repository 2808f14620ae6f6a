package com.crustplan.setup;

import java.util.List;

import org.springframework.data.jpa.repository.JpaRepository;

public interface SetupRepository extends JpaRepository<SavedSetup, Long> {

	List<SavedSetup> findAllByOrderByNameAsc();

}
