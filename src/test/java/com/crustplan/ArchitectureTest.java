package com.crustplan;

import static com.tngtech.archunit.core.domain.JavaClass.Predicates.resideInAPackage;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.junit.AnalyzeClasses;
import com.tngtech.archunit.junit.ArchTest;
import com.tngtech.archunit.lang.ArchRule;

/** The shape the project rules ask for, checked on the compiled classes. */
@AnalyzeClasses(packages = "com.crustplan", importOptions = ImportOption.DoNotIncludeTests.class)
class ArchitectureTest {

	@ArchTest
	static final ArchRule engineHasNoSpring = noClasses().that()
		.resideInAPackage("com.crustplan.engine..")
		.should()
		.dependOnClassesThat()
		.resideInAnyPackage("org.springframework..", "jakarta.persistence..", "jakarta.servlet..");

	@ArchTest
	static final ArchRule onlyThePlanServiceRunsTheEngine = noClasses().that()
		.resideOutsideOfPackage("com.crustplan.engine..")
		.and()
		.doNotHaveFullyQualifiedName("com.crustplan.plan.PlanService")
		.should()
		.dependOnClassesThat()
		.haveFullyQualifiedName("com.crustplan.engine.cook.CookSimulation");

	@ArchTest
	static final ArchRule controllersArePackagePrivate = classes().that()
		.areAnnotatedWith(org.springframework.stereotype.Controller.class)
		.or()
		.areAnnotatedWith(org.springframework.web.bind.annotation.RestController.class)
		.should()
		.notBePublic();

	@ArchTest
	static final ArchRule entitiesStayOutOfTheEngine = noClasses().that()
		.resideInAPackage("com.crustplan.engine..")
		.should()
		.dependOnClassesThat()
		.areAnnotatedWith(jakarta.persistence.Entity.class);

	/**
	 * The feature packages (surface, setup, plan, user, demo, model, api) and system
	 * import each other in one direction only. The engine counts as one slice here; its
	 * sub-packages have their own rule.
	 */
	@ArchTest
	static final ArchRule featurePackagesAreFreeOfCycles = slices().matching("com.crustplan.(*)..")
		.should()
		.beFreeOfCycles();

	/**
	 * system is the cross-cutting base (security, units, form binding, errors): it knows
	 * no feature.
	 */
	@ArchTest
	static final ArchRule systemImportsNoFeature = noClasses().that()
		.resideInAPackage("com.crustplan.system..")
		.should()
		.dependOnClassesThat()
		.resideInAnyPackage("com.crustplan.surface..", "com.crustplan.setup..", "com.crustplan.plan..",
				"com.crustplan.user..", "com.crustplan.demo..", "com.crustplan.model..");

}
