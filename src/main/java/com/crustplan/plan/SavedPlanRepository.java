package com.crustplan.plan;

import java.util.List;

import org.springframework.data.jpa.repository.JpaRepository;

public interface SavedPlanRepository extends JpaRepository<SavedPlan, Long> {

	List<SavedPlan> findAllByOrderByCreatedAtDesc();

}
